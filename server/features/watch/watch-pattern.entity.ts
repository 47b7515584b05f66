import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { WatchPattern } from '../../../shared/engine/types';
import { UserEntity } from '../users/user.entity';

@Entity({ name: 'watch_patterns' })
@Index('watch_patterns_user_text_unique', ['userId', 'text'], { unique: true })
export class WatchPatternEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  /** Canonical text from the engine's watchText, so "0704 ????" and "0704????" are one pattern. */
  @Column({ type: 'varchar', length: 64 })
  text: string;

  @Column({ type: 'varchar', length: 60, nullable: true })
  label: string | null;

  @Column({ type: 'jsonb' })
  pattern: WatchPattern;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
