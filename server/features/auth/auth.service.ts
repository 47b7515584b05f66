import type { DataSource } from 'typeorm';
import type { AuthResponse, LoginRequest, RegisterRequest } from '../../../shared/contracts/auth';
import { HttpError, conflict, unauthorized } from '../../lib/errors';
import { ACCESS_TOKEN_SECONDS, signAccessToken, signRefreshToken, verifyToken } from '../../lib/tokens';
import { UserEntity } from '../users/user.entity';
import { toPublicUser } from '../users/user-view';
import { LoginThrottle } from './login-throttle';
import { decoyHash, hashPassword, verifyPassword } from './passwords';

const WRONG_CREDENTIALS = 'That e-mail and password do not match an account';

export type AfterRegister = (user: UserEntity) => Promise<void>;

export class AuthService {
  private readonly throttle = new LoginThrottle();
  private readonly afterRegisterHooks: AfterRegister[] = [];

  constructor(private readonly dataSource: DataSource) {}

  /** Other features (default weight table, pending crew invites) hook into account creation here. */
  onRegister(hook: AfterRegister): void {
    this.afterRegisterHooks.push(hook);
  }

  private users() {
    return this.dataSource.getRepository(UserEntity);
  }

  issue(user: UserEntity): AuthResponse {
    return {
      token: signAccessToken(user.id, user.tokenVersion),
      refreshToken: signRefreshToken(user.id, user.tokenVersion),
      expiresIn: ACCESS_TOKEN_SECONDS,
      user: toPublicUser(user),
    };
  }

  async register(request: RegisterRequest): Promise<AuthResponse> {
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
    return this.issue(user);
  }

  async login(request: LoginRequest): Promise<AuthResponse> {
    const wait = this.throttle.retryAfterSeconds(request.email);
    if (wait > 0) {
      throw new HttpError(429, 'too_many_attempts', `Too many failed sign-ins for this e-mail; try again in ${Math.ceil(wait / 60)} minutes`);
    }
    const user = await this.users().findOne({ where: { email: request.email } });
    const ok = user ? await verifyPassword(user.passwordHash, request.password) : await verifyPassword(await decoyHash(), request.password);
    if (!user || !ok) {
      this.throttle.fail(request.email);
      throw unauthorized(WRONG_CREDENTIALS);
    }
    if (user.disabled) {
      throw new HttpError(403, 'disabled', 'This account has been disabled; contact the administrator');
    }
    this.throttle.succeed(request.email);
    return this.issue(user);
  }

  async refresh(refreshToken: string): Promise<AuthResponse> {
    const claims = verifyToken(refreshToken, 'refresh');
    const user = claims ? await this.users().findOne({ where: { id: claims.sub } }) : null;
    if (!claims || !user || user.disabled || user.tokenVersion !== claims.ver) {
      throw unauthorized('Your session has ended; sign in again');
    }
    return this.issue(user);
  }
}
