import { CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, Column } from 'typeorm';
import { UserEntity } from '../users/user.entity';

/**
 * The id of a scan that was deleted (an undo after upload). A device that sends the same note again
 * from an old queue gets "duplicate" instead of bringing the note back.
 */
@Entity({ name: 'scan_tombstones' })
@Index('scan_tombstones_user', ['userId'])
export class ScanTombstoneEntity {
  @PrimaryColumn({ type: 'uuid' })
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @CreateDateColumn({ name: 'deleted_at', type: 'timestamptz' })
  deletedAt: Date;
}
