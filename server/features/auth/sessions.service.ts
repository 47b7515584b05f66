import type { DataSource, EntityManager } from 'typeorm';
import type { DeviceSession } from '../../../shared/contracts/auth';
import { notFound, unauthorized } from '../../lib/errors';
import { hashSecretToken, newSecretToken } from '../../lib/secret-token';
import { AuthSessionEntity, type SessionEndReason } from './auth-session.entity';
import { deviceLabel } from './device-label';

export const REFRESH_TOKEN_DAYS = 30;
/** How long the secret just replaced is still accepted once (simultaneous refreshes from two tabs). */
export const REUSE_GRACE_SECONDS = 30;

const ENDED = 'Your session has ended; sign in again';

/** `<session id>.<secret>`: the id finds the row, the secret must match the one stored last. */
function splitToken(refreshToken: string): { id: string; secret: string } | null {
  const match = /^([0-9a-f-]{36})\.([A-Za-z0-9_-]{43})$/.exec(refreshToken);
  return match ? { id: match[1]!, secret: match[2]! } : null;
}

export interface StartedSession {
  sessionId: string;
  refreshToken: string;
}

/**
 * Sign-ins stored in PostgreSQL, so any app process can refresh, list or end them. Refresh tokens rotate:
 * each use stores a new secret, and presenting an older one ends the whole sign-in (a copied token).
 */
export class SessionsService {
  constructor(private readonly dataSource: DataSource) {}

  private repo(manager: EntityManager = this.dataSource.manager) {
    return manager.getRepository(AuthSessionEntity);
  }

  async start(userId: string, userAgent: string | undefined, manager?: EntityManager): Promise<StartedSession> {
    const secret = newSecretToken();
    const now = new Date();
    const session = await this.repo(manager).save(
      this.repo(manager).create({
        userId,
        tokenHash: hashSecretToken(secret),
        device: deviceLabel(userAgent),
        lastUsedAt: now,
        expiresAt: new Date(now.getTime() + REFRESH_TOKEN_DAYS * 24 * 60 * 60 * 1000),
        endedAt: null,
        endReason: null,
      }),
    );
    return { sessionId: session.id, refreshToken: `${session.id}.${secret}` };
  }

  /**
   * Spends a refresh token: a new one for the same sign-in, or a 401 (and the sign-in ended on reuse).
   * The secret replaced less than REUSE_GRACE_SECONDS ago is still taken once more, because two tabs of the
   * web app share one stored session and refresh at the same moment; older secrets mean a copy.
   */
  async rotate(refreshToken: string): Promise<{ userId: string } & StartedSession> {
    const parts = splitToken(refreshToken);
    if (!parts) throw unauthorized(ENDED);
    const presented = hashSecretToken(parts.secret);
    const secret = newSecretToken();
    const rotated = await this.dataSource.transaction(async (manager) => {
      const [row] = (await manager.query(
        `SELECT user_id, token_hash, previous_hash, rotated_at > now() - make_interval(secs => $2) AS in_grace, ended_at, expires_at
           FROM auth_sessions WHERE id = $1 FOR UPDATE`,
        [parts.id, REUSE_GRACE_SECONDS],
      )) as Array<{ user_id: string; token_hash: string; previous_hash: string | null; in_grace: boolean | null; ended_at: Date | null; expires_at: Date }>;
      if (!row || row.ended_at || row.expires_at.getTime() <= Date.now()) throw unauthorized(ENDED);
      const current = row.token_hash === presented;
      const racing = !current && row.previous_hash === presented && row.in_grace === true;
      if (!current && !racing) {
        // Only one holder can have the newest secret; an older one means a copy is in someone else's hands.
        await manager.query(`UPDATE auth_sessions SET ended_at = now(), end_reason = 'reuse' WHERE id = $1`, [parts.id]);
        return null;
      }
      await manager.query(
        `UPDATE auth_sessions SET previous_hash = token_hash, token_hash = $2, rotated_at = now(), last_used_at = now() WHERE id = $1`,
        [parts.id, hashSecretToken(secret)],
      );
      return { userId: row.user_id, sessionId: parts.id, refreshToken: `${parts.id}.${secret}` };
    });
    // Thrown after the commit, so the reuse mark stays.
    if (!rotated) throw unauthorized('This sign-in was ended because its refresh token was used twice; sign in again');
    return rotated;
  }

  async end(userId: string, sessionId: string, reason: SessionEndReason): Promise<void> {
    const result = await this.dataSource.query(
      `UPDATE auth_sessions SET ended_at = now(), end_reason = $3 WHERE id = $1 AND user_id = $2 AND ended_at IS NULL`,
      [sessionId, userId, reason],
    );
    if (!(result as [unknown, number])[1]) throw notFound('No such signed-in device');
  }

  /** Ends every sign-in of the user, except `keep` when given (the device making the change). */
  async endAll(userId: string, reason: SessionEndReason, keep: string | null = null, manager: EntityManager = this.dataSource.manager): Promise<void> {
    await manager.query(
      `UPDATE auth_sessions SET ended_at = now(), end_reason = $2 WHERE user_id = $1 AND ended_at IS NULL AND ($3::uuid IS NULL OR id <> $3::uuid)`,
      [userId, reason, keep],
    );
  }

  async list(userId: string, currentSessionId: string): Promise<DeviceSession[]> {
    const rows = await this.repo()
      .createQueryBuilder('s')
      .where('s.user_id = :userId AND s.ended_at IS NULL AND s.expires_at > now()', { userId })
      .orderBy('s.last_used_at', 'DESC')
      .limit(100)
      .getMany();
    return rows.map((row) => ({
      id: row.id,
      device: row.device,
      createdAt: row.createdAt.toISOString(),
      lastUsedAt: row.lastUsedAt.toISOString(),
      current: row.id === currentSessionId,
    }));
  }
}
