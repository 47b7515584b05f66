import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { HuntEntity } from '../hunts/hunt.entity';
import { UserEntity } from '../users/user.entity';

export type MemberRole = 'owner' | 'crew';

/** Who may see a hunt: its owner (one row with role owner) and its crew. Every hunt query joins through here. */
@Entity({ name: 'hunt_members' })
@Index('hunt_members_user', ['userId'])
export class HuntMemberEntity {
  @PrimaryColumn({ name: 'hunt_id', type: 'uuid' })
  huntId: string;

  @PrimaryColumn({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => HuntEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'hunt_id' })
  hunt?: HuntEntity;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'varchar', length: 8 })
  role: MemberRole;

  @Column({ name: 'joined_at', type: 'timestamptz' })
  joinedAt: Date;
}
