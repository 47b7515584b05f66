import type { DataSource } from 'typeorm';
import type { PublicUser, UpdateMeRequest } from '../../../shared/contracts/auth';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { UserEntity } from './user.entity';
import { toPublicUser } from './user-view';

export type BeforeDeleteUser = (userId: string) => Promise<void>;

export class UsersService {
  private readonly beforeDeleteHooks: BeforeDeleteUser[] = [];

  constructor(private readonly dataSource: DataSource) {}

  /** Features whose data lives outside PostgreSQL (photos in object storage) clean up here. */
  onBeforeDelete(hook: BeforeDeleteUser): void {
    this.beforeDeleteHooks.push(hook);
  }

  private users() {
    return this.dataSource.getRepository(UserEntity);
  }

  async get(userId: string): Promise<PublicUser> {
    const user = await this.users().findOne({ where: { id: userId } });
    if (!user) throw notFound('No such account');
    return toPublicUser(user);
  }

  async update(userId: string, change: UpdateMeRequest): Promise<PublicUser> {
    const user = await this.users().findOne({ where: { id: userId } });
    if (!user) throw notFound('No such account');
    if (change.email && change.email !== user.email) {
      if (await this.users().exists({ where: { email: change.email } })) throw conflict('An account with that e-mail already exists');
      user.email = change.email;
    }
    if (change.displayName) user.displayName = change.displayName;
    if (change.newPassword) {
      if (!(await verifyPassword(user.passwordHash, change.currentPassword ?? ''))) {
        throw new HttpError(400, 'invalid', 'Some fields need attention', { currentPassword: 'is not your current password' });
      }
      user.passwordHash = await hashPassword(change.newPassword);
      user.tokenVersion += 1;
    }
    return toPublicUser(await this.users().save(user));
  }

  /** Removes the account; every row a user owns references it with ON DELETE CASCADE. */
  async remove(userId: string): Promise<void> {
    for (const hook of this.beforeDeleteHooks) await hook(userId);
    await this.users().delete({ id: userId });
  }
}
