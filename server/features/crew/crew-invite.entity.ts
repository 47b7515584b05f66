import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { HuntEntity } from '../hunts/hunt.entity';
import { UserEntity } from '../users/user.entity';

/**
 * An e-mailed invitation to join a hunt's crew. The mail carries the token; only its SHA-256 is stored.
 * Accepting stamps `accepted_at`/`accepted_by`, so a link works once.
 */
@Entity({ name: 'crew_invites' })
@Index('crew_invites_hash_unique', ['tokenHash'], { unique: true })
@Index('crew_invites_hunt', ['huntId'])
@Index('crew_invites_inviter', ['invitedBy'])
export class CrewInviteEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'hunt_id', type: 'uuid' })
  huntId: string;

  @ManyToOne(() => HuntEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'hunt_id' })
  hunt?: HuntEntity;

  @Column({ name: 'invited_by', type: 'uuid' })
  invitedBy: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'invited_by' })
  inviter?: UserEntity;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'token_hash', type: 'varchar', length: 64 })
  tokenHash: string;

  @Column({ name: 'expires_at', type: 'timestamptz' })
  expiresAt: Date;

  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'accepted_by', type: 'uuid', nullable: true })
  acceptedBy: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'accepted_by' })
  acceptor?: UserEntity;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
