import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export type UserRole = 'collector' | 'admin';

@Entity({ name: 'users' })
export class UserEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  // Stored lower-cased by the service, so one unique index is enough.
  @Index('users_email_unique', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 255 })
  passwordHash: string;

  @Column({ name: 'display_name', type: 'varchar', length: 80 })
  displayName: string;

  @Column({ type: 'varchar', length: 16, default: 'collector' })
  role: UserRole;

  @Column({ type: 'boolean', default: false })
  disabled: boolean;

  // Raised on password change or disable so older tokens stop working at once.
  @Column({ name: 'token_version', type: 'integer', default: 0 })
  tokenVersion: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
