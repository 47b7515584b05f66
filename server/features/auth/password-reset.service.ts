import { createHash, randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { AuthResponse, ForgotResponse, ResetRequest } from '../../../shared/contracts/auth';
import { HttpError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { UserEntity } from '../users/user.entity';
import type { AuthService, ClientInfo } from './auth.service';
import { assertPasswordAllowed } from './password-policy';
import { hashPassword } from './passwords';
import type { ResetMailer } from './reset-mailer';
import type { SessionsService } from './sessions.service';

export const RESET_TOKEN_MINUTES = 60;
/** Reset mails per account per hour; more requests are accepted and quietly dropped. */
const MAX_RESETS_PER_HOUR = 5;

const ACCEPTED: ForgotResponse = {
  accepted: true,
  message: 'If an account has that e-mail, a link to choose a new password is on its way. It works once, within an hour.',
};

export const hashResetToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

function badToken(): HttpError {
  return new HttpError(400, 'invalid', 'This reset link cannot be used', {
    token: 'has expired or was already used; ask for a new link',
  });
}

export class PasswordResetService {
  private readonly inFlight = new Set<Promise<void>>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly auth: AuthService,
    private readonly mailer: ResetMailer,
    private readonly publicUrl: () => string,
    private readonly sessions: SessionsService,
  ) {}

  /**
   * Same answer, at the same moment, for every e-mail: the lookup, the token and the mail happen after the
   * answer has gone, so neither the words nor the timing tell which addresses have accounts.
   */
  async forgot(email: string): Promise<ForgotResponse> {
    const work = this.deliver(email)
      .catch((error: unknown) => logger.error({ err: error }, 'password reset could not be prepared'))
      .finally(() => this.inFlight.delete(work));
    this.inFlight.add(work);
    return ACCEPTED;
  }

  /** Resolves when every reset mail asked for so far has been handled (tests, graceful shutdown). */
  async settled(): Promise<void> {
    while (this.inFlight.size) await Promise.all([...this.inFlight]);
  }

  /** Makes a token for an account's own use (the undo of an e-mail change leads straight to a new password). */
  async issueToken(userId: string): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + RESET_TOKEN_MINUTES * 60 * 1000);
    await this.dataSource.query(`INSERT INTO password_reset_tokens (user_id, token_hash, expires_at) VALUES ($1, $2, $3)`, [
      userId,
      hashResetToken(token),
      expiresAt,
    ]);
    return token;
  }

  private async deliver(email: string): Promise<void> {
    const user = await this.dataSource.getRepository(UserEntity).findOne({ where: { email } });
    if (!user || user.disabled) return;
    const [recent] = (await this.dataSource.query(
      `SELECT count(*)::int AS n FROM password_reset_tokens WHERE user_id = $1 AND created_at > now() - interval '1 hour'`,
      [user.id],
    )) as Array<{ n: number }>;
    if ((recent?.n ?? 0) >= MAX_RESETS_PER_HOUR) return;
    const token = await this.issueToken(user.id);
    const expiresAt = new Date(Date.now() + RESET_TOKEN_MINUTES * 60 * 1000);
    const link = `${this.publicUrl().replace(/\/$/, '')}/reset-password?token=${encodeURIComponent(token)}`;
    try {
      await this.mailer.sendReset({ to: user.email, displayName: user.displayName, token, link, expiresAt });
    } catch (error) {
      // The answer has already gone; a mail failure is logged, not reported.
      logger.error({ err: error, userId: user.id }, 'password reset mail could not be sent');
    }
  }

  /**
   * Spends the token and sets the password in one transaction. The UPDATE … WHERE used_at IS NULL
   * makes the token single-use even when two resets race; every other open token and every session
   * of the account end with it.
   */
  async reset(request: ResetRequest, client: ClientInfo): Promise<AuthResponse> {
    const tokenHash = hashResetToken(request.token);
    const [pending] = (await this.dataSource.query(
      `SELECT user_id FROM password_reset_tokens WHERE token_hash = $1 AND used_at IS NULL AND expires_at > now()`,
      [tokenHash],
    )) as Array<{ user_id: string }>;
    if (!pending) throw badToken();
    const [owner] = (await this.dataSource.query(`SELECT email, display_name FROM users WHERE id = $1`, [pending.user_id])) as Array<{
      email: string;
      display_name: string;
    }>;
    assertPasswordAllowed(request.password, { email: owner?.email, displayName: owner?.display_name });
    const passwordHash = await hashPassword(request.password);
    const user = await this.dataSource.transaction(async (manager) => {
      const spent = (await manager.query(
        `UPDATE password_reset_tokens SET used_at = now()
          WHERE token_hash = $1 AND used_at IS NULL AND expires_at > now() RETURNING user_id`,
        [tokenHash],
      )) as [Array<{ user_id: string }>, number]; // TypeORM answers an UPDATE with [rows, rowCount]
      const userId = spent[0][0]?.user_id;
      if (!userId) throw badToken();
      await manager.query(`UPDATE password_reset_tokens SET used_at = now() WHERE user_id = $1 AND used_at IS NULL`, [userId]);
      const account = await manager.getRepository(UserEntity).findOne({ where: { id: userId } });
      if (!account || account.disabled) throw badToken();
      account.passwordHash = passwordHash;
      account.tokenVersion += 1;
      await this.sessions.endAll(userId, 'reset', null, manager);
      return manager.getRepository(UserEntity).save(account);
    });
    return this.auth.issue(user, client);
  }
}
