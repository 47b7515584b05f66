import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { KeeperEntity } from '../keepers/keeper.entity';
import { UserEntity } from '../users/user.entity';

/**
 * A read-only link to one keeper. Only the SHA-256 of its token is kept, like reset tokens, so the table
 * alone opens nothing; revoking stamps `revoked_at` and the link answers 404 from then on.
 */
@Entity({ name: 'share_links' })
@Index('share_links_hash_unique', ['tokenHash'], { unique: true })
@Index('share_links_keeper', ['keeperId'])
@Index('share_links_user', ['userId'])
export class ShareLinkEntity {
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

  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'revoked_at', type: 'timestamptz', nullable: true })
  revokedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
