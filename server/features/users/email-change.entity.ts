import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { UserEntity } from './user.entity';

/**
 * An e-mail change, kept so the old address can undo it: the mail to the old address carries a token
 * (only its SHA-256 is stored) that works once, for 7 days.
 */
@Entity({ name: 'email_changes' })
@Index('email_changes_hash_unique', ['tokenHash'], { unique: true })
@Index('email_changes_user', ['userId'])
export class EmailChangeEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ name: 'old_email', type: 'varchar', length: 254 })
  oldEmail: string;

  @Column({ name: 'new_email', type: 'varchar', length: 254 })
  newEmail: string;

  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'undone_at', type: 'timestamptz', nullable: true })
  undoneAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
