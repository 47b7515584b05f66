import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { UserEntity } from '../users/user.entity';

export type HuntStatus = 'open' | 'closed';

@Entity({ name: 'hunts' })
@Index('hunts_owner', ['ownerId'])
export class HuntEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'owner_id', type: 'uuid' })
  ownerId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'owner_id' })
  owner?: UserEntity;

  @Column({ type: 'varchar', length: 120 })
  title: string;

  @Column({ type: 'varchar', length: 120 })
  source: string;

  /** Face value in whole dollars. */
  @Column({ type: 'integer' })
  denomination: number;

  @Column({ name: 'planned_straps', type: 'integer' })
  plannedStraps: number;

  /**
   * New notes in serial order (straight from a Federal Reserve Bank) rather than circulated ones: their
   * finds come in clumps, so Tally compares them with the exact sequential distribution, not Poisson.
   */
  @Column({ name: 'in_sequence', type: 'boolean', default: false })
  inSequence: boolean;

  /** The series printed on the notes, when the hunter knows it (e.g. "2017A"); checks serial formats. */
  @Column({ type: 'varchar', length: 8, nullable: true })
  series: string | null;

  @Column({ type: 'varchar', length: 8, default: 'open' })
  status: HuntStatus;

  // Set from the app (millisecond precision), never by the database, because keyset cursors carry it.
  @Column({ name: 'started_at', type: 'timestamptz' })
  startedAt: Date;

  @Column({ name: 'closed_at', type: 'timestamptz', nullable: true })
  closedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
