import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { HuntEntity } from '../hunts/hunt.entity';

/**
 * What the hunter recorded for one strap. Searched and pulled counts come from the scans, so this row
 * exists only once something was recorded; a strap without one reads as swappedIn 0, shortOver 0.
 */
@Entity({ name: 'straps' })
export class StrapEntity {
  @PrimaryColumn({ name: 'hunt_id', type: 'uuid' })
  huntId: string;

  @PrimaryColumn({ type: 'integer' })
  number: number;

  @ManyToOne(() => HuntEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'hunt_id' })
  hunt?: HuntEntity;

  @Column({ name: 'swapped_in', type: 'integer', default: 0 })
  swappedIn: number;

  @Column({ name: 'short_over', type: 'integer', default: 0 })
  shortOver: number;

  @Column({ type: 'varchar', length: 200, nullable: true })
  note: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
