import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { WeightTable } from '../../../shared/engine/types';
import { UserEntity } from '../users/user.entity';

@Entity({ name: 'weight_tables' })
@Index('weight_tables_user_name_unique', ['userId', 'name'], { unique: true })
// The database, not the service, guarantees a user never has two active tables.
@Index('weight_tables_one_active', ['userId'], { unique: true, where: '"active"' })
export class WeightTableEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user?: UserEntity;

  @Column({ type: 'varchar', length: 60 })
  name: string;

  @Column({ type: 'boolean', default: false })
  active: boolean;

  @Column({ type: 'jsonb' })
  weights: WeightTable;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
