import type { NextFunction, Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { UserEntity, type UserRole } from '../features/users/user.entity';
import { forbidden, unauthorized } from './errors';
import { verifyToken } from './tokens';

export interface AuthedUser {
  id: string;
  email: string;
  displayName: string;
  role: UserRole;
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: AuthedUser;
  }
}

/**
 * Checks the bearer token and then the user row on every request, so a disabled account or a
 * changed password ends its sessions at once rather than when the token expires.
 */
export function requireAuth(dataSource: DataSource): RequestHandler {
  const users = dataSource.getRepository(UserEntity);
  return (req: Request, _res: Response, next: NextFunction) => {
    const header = req.get('authorization') ?? '';
    const match = /^Bearer\s+(\S+)$/i.exec(header);
    const claims = match ? verifyToken(match[1], 'access') : null;
    if (!claims) {
      next(unauthorized(match ? 'Your session has expired; sign in again' : 'Sign in to continue'));
      return;
    }
    users
      .findOne({ where: { id: claims.sub } })
      .then((user) => {
        if (!user || user.disabled || user.tokenVersion !== claims.ver) {
          next(unauthorized('Your session has ended; sign in again'));
          return;
        }
        req.user = { id: user.id, email: user.email, displayName: user.displayName, role: user.role };
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
