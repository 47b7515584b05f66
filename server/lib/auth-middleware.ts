import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { completeWeights } from '../../shared/engine';
import type { WeightTable } from '../../shared/engine';
import type { UserRole } from '../features/users/user.entity';
import { forbidden, unauthorized } from './errors';
import { verifyAccessToken } from './tokens';

export interface AuthedUser {
  id: string;
  email: string;
  displayName: string;
  role: UserRole;
  /** The sign-in this request's token belongs to. */
  sessionId: string;
  /**
   * The user's active weight table (completed with the engine's defaults), read in the same statement
   * as the sign-in: most requests score or count with it, and a second round trip for it cost more than
   * the row itself. Read per request, never cached, so a change shows on the very next request.
   */
  weights: WeightTable;
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: AuthedUser;
  }
}

/**
 * Checks the bearer token, then the user row and the sign-in it belongs to (one query) on every request,
 * so a disabled account, a changed password or a sign-out ends its sessions at once, in every process.
 * The same statement brings the active weight table (see AuthedUser.weights).
 */
export function requireAuth(dataSource: DataSource): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer\s+(\S+)$/i.exec(header);
    const claims = match ? verifyAccessToken(match[1]!) : null;
    if (!claims) {
      next(unauthorized(match ? 'Your session has expired; sign in again' : 'Sign in to continue'));
      return;
    }
    dataSource
      .query(
        `SELECT u.id, u.email, u.display_name, u.role, u.disabled, u.token_version,
                (SELECT w.weights FROM weight_tables w WHERE w.user_id = u.id AND w.active) AS weights
           FROM users u JOIN auth_sessions s ON s.user_id = u.id
          WHERE u.id = $1 AND s.id = $2 AND s.ended_at IS NULL AND s.expires_at > now()`,
        [claims.sub, claims.sid],
      )
      .then((rows: Array<{ id: string; email: string; display_name: string; role: UserRole; disabled: boolean; token_version: number; weights: WeightTable | null }>) => {
        const user = rows[0];
        if (!user || user.disabled || user.token_version !== claims.ver) {
          next(unauthorized('Your session has ended; sign in again'));
          return;
        }
        req.user = {
          id: user.id,
          email: user.email,
          displayName: user.display_name,
          role: user.role,
          sessionId: claims.sid,
          weights: completeWeights(user.weights),
        };
        next();
      })
      .catch(next);
  };
}

export function requireRole(role: UserRole): RequestHandler {
  return (req, _res, next) => {
    next(req.user?.role === role ? undefined : forbidden('This needs an admin account'));
  };
}

/** The signed-in user; only call behind requireAuth. */
export function currentUser(req: Request): AuthedUser {
  if (!req.user) throw unauthorized();
  return req.user;
}

/** The signed-in device's session id; only call behind requireAuth. */
export function currentSession(req: Request): string {
  return currentUser(req).sessionId;
}
