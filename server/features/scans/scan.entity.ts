import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { HuntEntity } from '../hunts/hunt.entity';
import { UserEntity } from '../users/user.entity';

/**
 * One logged note. The id comes from the device, so a retried upload hits the primary key instead of
 * storing the note twice. Patterns, points and keep are the server's own reading at upload time.
 */
@Entity({ name: 'scans' })
// Keyset pages (newest first), tallies and strap sheets all start from a hunt.
@Index('scans_hunt_time', ['huntId', 'scannedAt', 'id'])
// Best finds only: partial, because most notes score 0 and every index entry slows a 1,000-scan batch.
@Index('scans_hunt_best', ['huntId', 'points'], { where: '"points" > 0' })
@Index('scans_user', ['userId'])
export class ScanEntity {
  @PrimaryColumn({ type: 'uuid' })
  id: string;

  @Column({ name: 'hunt_id', type: 'uuid' })
  huntId: string;

  @ManyToOne(() => HuntEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'hunt_id' })
  hunt?: HuntEntity;

  /** Who logged it: a crew member's scans go when their account does. */
  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'integer' })
  strap: number;

  /** As typed. */
  @Column({ type: 'varchar', length: 40 })
  serial: string;

  @Column({ type: 'varchar', length: 8 })
  digits: string;

  @Column({ type: 'integer' })
  value: number;

  @Column({ type: 'varchar', length: 2 })
  prefix: string;

  @Column({ type: 'varchar', length: 1 })
  suffix: string;

  @Column({ type: 'boolean' })
  star: boolean;

  @Column({ type: 'varchar', length: 1, nullable: true })
  district: string | null;

  @Column({ type: 'boolean' })
  pulled: boolean;

  // Bit i is the engine's PATTERN_IDS[i]; an integer lets a tally count every pattern in one pass.
  @Column({ name: 'pattern_mask', type: 'integer' })
  patternMask: number;

  @Column({ type: 'double precision' })
  points: number;

  @Column({ type: 'boolean' })
  keep: boolean;

  /** How the serial reached the device: typed on the keypad or read by the camera. */
  @Column({ name: 'entry_method', type: 'varchar', length: 8, default: 'keypad' })
  entryMethod: 'keypad' | 'camera';

  /** The camera's confidence in the whole serial (0–1); null for typed notes. */
  @Column({ name: 'camera_confidence', type: 'real', nullable: true })
  cameraConfidence: number | null;

  /** For a star note: the size of its printing run as the hunter looked it up (no run data ships). */
  @Column({ name: 'star_run_size', type: 'integer', nullable: true })
  starRunSize: number | null;

  @Column({ name: 'scanned_at', type: 'timestamptz' })
  scannedAt: Date;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
