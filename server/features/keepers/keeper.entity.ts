import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { HuntEntity } from '../hunts/hunt.entity';
import { ScanEntity } from '../scans/scan.entity';
import { UserEntity } from '../users/user.entity';

export type KeeperStatus = 'kept' | 'traded' | 'sold' | 'spent';

/** A note the hunter kept. It belongs to the hunter alone: it outlives the hunt and scan it came from. */
@Entity({ name: 'keepers' })
@Index('keepers_user_found', ['userId', 'foundAt', 'id'])
// One keeper per logged note and owner, so a retried "keep" never makes two.
@Index('keepers_user_scan_unique', ['userId', 'scanId'], { unique: true })
// Deleting a hunt sets these to null row by row; without indexes each deleted scan would scan keepers.
@Index('keepers_scan', ['scanId'])
@Index('keepers_hunt', ['huntId'])
export class KeeperEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ name: 'scan_id', type: 'uuid', nullable: true })
  scanId: string | null;

  @ManyToOne(() => ScanEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'scan_id' })
  scan?: ScanEntity;

  @Column({ name: 'hunt_id', type: 'uuid', nullable: true })
  huntId: string | null;

  @ManyToOne(() => HuntEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'hunt_id' })
  hunt?: HuntEntity;

  @Column({ type: 'varchar', length: 40 })
  serial: string;

  @Column({ type: 'varchar', length: 8 })
  digits: string;

  @Column({ type: 'varchar', length: 2 })
  prefix: string;

  @Column({ type: 'varchar', length: 1 })
  suffix: string;

  @Column({ type: 'boolean' })
  star: boolean;

  @Column({ type: 'varchar', length: 8, nullable: true })
  series: string | null;

  @Column({ type: 'varchar', length: 1, nullable: true })
  district: string | null;

  @Column({ type: 'varchar', length: 2, nullable: true })
  facility: 'DC' | 'FW' | null;

  @Column({ type: 'integer', nullable: true })
  denomination: number | null;

  @Column({ type: 'smallint', nullable: true })
  grade: number | null;

  /** The hunter's own yes/no: never pressed, washed or repaired. Null until they judge it. */
  @Column({ name: 'original_paper', type: 'boolean', nullable: true })
  originalPaper: boolean | null;

  /** For a star note: the size of its printing run as the hunter looked it up (no run data ships). */
  @Column({ name: 'star_run_size', type: 'integer', nullable: true })
  starRunSize: number | null;

  @Column({ name: 'estimated_value_cents', type: 'integer', nullable: true })
  estimatedValueCents: number | null;

  @Column({ type: 'varchar', length: 8, default: 'kept' })
  status: KeeperStatus;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'pattern_mask', type: 'integer' })
  patternMask: number;

  @Column({ type: 'double precision' })
  points: number;

  @Column({ name: 'found_at', type: 'timestamptz' })
  foundAt: Date;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
