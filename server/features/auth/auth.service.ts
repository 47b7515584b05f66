import type { DataSource } from 'typeorm';
import type { AuthResponse, LoginRequest, RegisterRequest } from '../../../shared/contracts/auth';
import { HttpError, conflict, unauthorized } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { ACCESS_TOKEN_SECONDS, signAccessToken } from '../../lib/tokens';
import { UserEntity } from '../users/user.entity';
import { toPublicUser } from '../users/user-view';
import { assertPasswordAllowed } from './password-policy';
import { decoyHash, hashPassword, needsRehash, verifyPassword } from './passwords';
import type { SessionsService } from './sessions.service';

const WRONG_CREDENTIALS = 'That e-mail and password do not match an account';

export type AfterRegister = (user: UserEntity) => Promise<void>;

/** Who is signing in from where; the device label is what the You screen lists. */
export interface ClientInfo {
  userAgent?: string;
}

export class AuthService {
  private readonly afterRegisterHooks: AfterRegister[] = [];

  constructor(
    private readonly dataSource: DataSource,
    private readonly sessions: SessionsService,
  ) {}

  /** Other features (default weight table, pending crew invites) hook into account creation here. */
  onRegister(hook: AfterRegister): void {
    this.afterRegisterHooks.push(hook);
  }

  private users() {
    return this.dataSource.getRepository(UserEntity);
  }

  /** A new sign-in (row in auth_sessions) with its first pair of tokens. */
  async issue(user: UserEntity, client: ClientInfo): Promise<AuthResponse> {
    const { sessionId, refreshToken } = await this.sessions.start(user.id, client.userAgent);
    return this.answer(user, sessionId, refreshToken);
  }

  private answer(user: UserEntity, sessionId: string, refreshToken: string): AuthResponse {
    return {
      token: signAccessToken(user.id, user.tokenVersion, sessionId),
      refreshToken,
      expiresIn: ACCESS_TOKEN_SECONDS,
      user: toPublicUser(user),
    };
  }

  async register(request: RegisterRequest, client: ClientInfo): Promise<AuthResponse> {
    assertPasswordAllowed(request.password, request);
    // A 409 for a known address tells a caller that the address has an account. Kept on purpose (immediate
    // sign-in after registering needs it); the per-client limit slows anyone walking a list (RELIABILITY.md).
    if (await this.users().exists({ where: { email: request.email } })) {
      throw conflict('An account with that e-mail already exists');
    }
    const passwordHash = await hashPassword(request.password);
    let user: UserEntity;
    try {
      user = await this.users().save(
        this.users().create({ email: request.email, passwordHash, displayName: request.displayName, role: 'collector' }),
      );
    } catch (error) {
      // Two registrations racing for one address: the unique index decides, the loser gets a 409.
      if ((error as { code?: string }).code === '23505') throw conflict('An account with that e-mail already exists');
      throw error;
    }
    for (const hook of this.afterRegisterHooks) await hook(user);
    return this.issue(user, client);
  }

  /** Checks the password; throws 401 when wrong (the route counts those per client and account). */
  async login(request: LoginRequest, client: ClientInfo): Promise<AuthResponse> {
    const user = await this.users().findOne({ where: { email: request.email } });
    const ok = user ? await verifyPassword(user.passwordHash, request.password) : await verifyPassword(await decoyHash(), request.password);
    if (!user || !ok) throw unauthorized(WRONG_CREDENTIALS);
    if (user.disabled) {
      throw new HttpError(403, 'disabled', 'This account has been disabled; contact the administrator');
    }
    if (needsRehash(user.passwordHash)) await this.upgradeHash(user, request.password);
    return this.issue(user, client);
  }

  // Hashes made with older parameters are replaced the moment the password is known again.
  private async upgradeHash(user: UserEntity, password: string): Promise<void> {
    const fresh = await hashPassword(password);
    try {
      await this.users().update({ id: user.id, passwordHash: user.passwordHash }, { passwordHash: fresh });
      user.passwordHash = fresh;
    } catch (error) {
      logger.warn({ err: error, userId: user.id }, 'password hash upgrade failed; kept the old hash');
    }
  }

  async refresh(refreshToken: string): Promise<AuthResponse> {
    const rotated = await this.sessions.rotate(refreshToken);
    const user = await this.users().findOne({ where: { id: rotated.userId } });
    if (!user || user.disabled) throw unauthorized('Your session has ended; sign in again');
    return this.answer(user, rotated.sessionId, rotated.refreshToken);
  }
}
