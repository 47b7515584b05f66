import type { DataSource } from 'typeorm';
import { hashPassword } from '../../features/auth/passwords';
import { UserEntity, type UserRole } from '../../features/users/user.entity';
import { DEMO_ADMIN, DEMO_COLLECTOR } from './demo-accounts';

async function ensureUser(dataSource: DataSource, account: { email: string; password: string; displayName: string }, role: UserRole): Promise<{ user: UserEntity; created: boolean }> {
  const users = dataSource.getRepository(UserEntity);
  const existing = await users.findOne({ where: { email: account.email } });
  if (existing) return { user: existing, created: false };
  const user = await users.save(
    users.create({ email: account.email, displayName: account.displayName, passwordHash: await hashPassword(account.password), role }),
  );
  return { user, created: true };
}

/**
 * Fills an empty database with a lived-in demo. Idempotent: each part checks before it writes,
 * so a second `npm start` changes nothing.
 */
export async function seedDemo(dataSource: DataSource): Promise<{ created: string[] }> {
  const created: string[] = [];
  const collector = await ensureUser(dataSource, DEMO_COLLECTOR, 'collector');
  if (collector.created) created.push(`collector ${DEMO_COLLECTOR.email}`);
  const admin = await ensureUser(dataSource, DEMO_ADMIN, 'admin');
  if (admin.created) created.push(`admin ${DEMO_ADMIN.email}`);
  return { created };
}
