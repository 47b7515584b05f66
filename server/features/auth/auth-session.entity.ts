import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { UserEntity } from '../users/user.entity';

export type SessionEndReason = 'logout' | 'everywhere' | 'reuse' | 'password' | 'email' | 'reset' | 'undo';

/**
 * One sign-in on one device. Its refresh token is `<id>.<secret>`; only the secret's SHA-256 is kept, and
 * each refresh replaces it, so an older secret presented again means the token was copied (reuse).
 */
@Entity({ name: 'auth_sessions' })
@Index('auth_sessions_user', ['userId'])
export class AuthSessionEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  /** The secret this one replaced, and when: two tabs refreshing at once both present it (see rotate). */
  @Column({ name: 'previous_hash', type: 'varchar', length: 64, nullable: true })
  previousHash: string | null;

  @Column({ name: 'rotated_at', type: 'timestamptz', nullable: true })
  rotatedAt: Date | null;

  /** A short label from the User-Agent ("Chrome on Android"), so the owner can tell devices apart. */
  @Column({ type: 'varchar', length: 80 })
  device: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'last_used_at', type: 'timestamptz' })
  lastUsedAt: Date;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'ended_at', type: 'timestamptz', nullable: true })
  endedAt: Date | null;

  @Column({ name: 'end_reason', type: 'varchar', length: 16, nullable: true })
  endReason: SessionEndReason | null;
}
