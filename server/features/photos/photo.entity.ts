import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { PhotoContentType, PhotoSide } from '../../../shared/contracts/photos';
import { KeeperEntity } from '../keepers/keeper.entity';
import { UserEntity } from '../users/user.entity';

/**
 * A keeper's front or back photo: metadata here, the bytes in the object store under `object_key`
 * (and a small JPEG under `thumb_key`). One photo per side; a new upload replaces the old one.
 */
@Entity({ name: 'photos' })
@Index('photos_keeper_side_unique', ['keeperId', 'side'], { unique: true })
@Index('photos_user', ['userId'])
export class PhotoEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'keeper_id', type: 'uuid' })
  keeperId: string;

  @ManyToOne(() => KeeperEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'keeper_id' })
  keeper?: KeeperEntity;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'varchar', length: 5 })
  side: PhotoSide;

  @Column({ name: 'content_type', type: 'varchar', length: 20 })
  contentType: PhotoContentType;

  @Column({ name: 'byte_size', type: 'integer' })
  byteSize: number;

  @Column({ type: 'integer' })
  width: number;

  @Column({ type: 'integer' })
  height: number;

  @Column({ name: 'object_key', type: 'varchar', length: 300 })
  objectKey: string;

  @Column({ name: 'thumb_key', type: 'varchar', length: 300 })
  thumbKey: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
