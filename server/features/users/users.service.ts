import type { DataSource } from 'typeorm';
import type { PublicUser, UndoEmailResponse, UpdateMeRequest } from '../../../shared/contracts/auth';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { renderMail, type Mailer } from '../../lib/mail';
import { hashSecretToken, newSecretToken } from '../../lib/secret-token';
import { assertPasswordAllowed } from '../auth/password-policy';
import type { PasswordResetService } from '../auth/password-reset.service';
import { hashPassword, verifyPassword } from '../auth/passwords';
import type { SessionsService } from '../auth/sessions.service';
import { EmailChangeEntity } from './email-change.entity';
import { UserEntity } from './user.entity';
import { toPublicUser } from './user-view';

export type BeforeDeleteUser = (userId: string) => Promise<void>;

/** How long the old address can undo an e-mail change. */
export const EMAIL_UNDO_DAYS = 7;

const wrongPassword = () => new HttpError(400, 'invalid', 'Some fields need attention', { currentPassword: 'is not your current password' });
const badUndo = () => new HttpError(400, 'invalid', 'This link cannot be used', { token: 'has expired or was already used' });

export class UsersService {
  private readonly beforeDeleteHooks: BeforeDeleteUser[] = [];

  constructor(
    private readonly dataSource: DataSource,
    private readonly sessions: SessionsService,
    private readonly mailer: Mailer,
    private readonly publicUrl: () => string,
    private readonly passwordReset: () => PasswordResetService,
  ) {}

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

  /**
   * Name changes need nothing more; the e-mail and the password need the current password, and either
   * change ends every other sign-in of the account. The device making the change stays signed in.
   */
  async update(userId: string, sessionId: string, change: UpdateMeRequest): Promise<PublicUser> {
    const user = await this.users().findOne({ where: { id: userId } });
    if (!user) throw notFound('No such account');
    const newEmail = change.email && change.email !== user.email ? change.email : null;
    if (newEmail || change.newPassword) {
      if (!(await verifyPassword(user.passwordHash, change.currentPassword ?? ''))) throw wrongPassword();
    }
    if (newEmail && (await this.users().exists({ where: { email: newEmail } }))) throw conflict('An account with that e-mail already exists');
    const oldEmail = user.email;
    if (change.displayName) user.displayName = change.displayName;
    if (change.newPassword) {
      assertPasswordAllowed(change.newPassword, { email: newEmail ?? user.email, displayName: user.displayName }, 'newPassword');
      user.passwordHash = await hashPassword(change.newPassword);
    }
    const undoToken = newEmail ? newSecretToken() : null;
    const saved = await this.dataSource.transaction(async (manager) => {
      if (newEmail) user.email = newEmail;
      let row: UserEntity;
      try {
        row = await manager.getRepository(UserEntity).save(user);
      } catch (error) {
        if ((error as { code?: string }).code === '23505') throw conflict('An account with that e-mail already exists');
        throw error;
      }
      if (newEmail && undoToken) {
        await manager.getRepository(EmailChangeEntity).insert({
          userId,
          oldEmail,
          newEmail,
          tokenHash: hashSecretToken(undoToken),
          expiresAt: new Date(Date.now() + EMAIL_UNDO_DAYS * 24 * 60 * 60 * 1000),
          undoneAt: null,
        });
      }
      if (newEmail || change.newPassword) await this.sessions.endAll(userId, newEmail ? 'email' : 'password', sessionId, manager);
      return row;
    });
    if (newEmail && undoToken) await this.mailUndo(oldEmail, newEmail, saved.displayName, undoToken);
    return toPublicUser(saved);
  }

  private async mailUndo(oldEmail: string, newEmail: string, displayName: string, token: string): Promise<void> {
    const link = `${this.publicUrl().replace(/\/$/, '')}/undo-email?token=${encodeURIComponent(token)}`;
    const body = renderMail('Your Strapsift e-mail was changed', [
      { text: `Hello ${displayName}, the e-mail of your Strapsift account was changed from ${oldEmail} to ${newEmail}.` },
      { text: 'If you did this, there is nothing to do. If you did not, undo it: the account comes back to this address, every sign-in ends, and you choose a new password.' },
      { link, label: 'Undo the change' },
      { small: `The link works once, for ${EMAIL_UNDO_DAYS} days.` },
    ]);
    try {
      await this.mailer.send({ to: oldEmail, subject: 'Your Strapsift e-mail was changed', ...body });
    } catch (error) {
      logger.error({ err: error }, 'e-mail change notice could not be sent');
    }
  }

  /** The old address takes the account back: e-mail restored, every session ended, a new password to choose. */
  async undoEmailChange(token: string): Promise<UndoEmailResponse> {
    const restored = await this.dataSource.transaction(async (manager) => {
      const spent = (await manager.query(
        `UPDATE email_changes SET undone_at = now() WHERE token_hash = $1 AND undone_at IS NULL AND expires_at > now() RETURNING user_id, old_email`,
        [hashSecretToken(token)],
      )) as [Array<{ user_id: string; old_email: string }>, number]; // TypeORM answers an UPDATE with [rows, rowCount]
      const row = spent[0][0];
      if (!row) throw badUndo();
      const taken = (await manager.query(`SELECT 1 FROM users WHERE email = $1 AND id <> $2`, [row.old_email, row.user_id])) as unknown[];
      if (taken.length) throw conflict('That address now belongs to another account; contact the administrator');
      await manager.query(`UPDATE users SET email = $2, token_version = token_version + 1, updated_at = now() WHERE id = $1`, [row.user_id, row.old_email]);
      await this.sessions.endAll(row.user_id, 'undo', null, manager);
      return row;
    });
    const resetToken = await this.passwordReset().issueToken(restored.user_id);
    return { email: restored.old_email, resetToken };
  }

  /** Removes the account; every row a user owns references it with ON DELETE CASCADE. */
  async remove(userId: string): Promise<void> {
    for (const hook of this.beforeDeleteHooks) await hook(userId);
    await this.users().delete({ id: userId });
  }
}
