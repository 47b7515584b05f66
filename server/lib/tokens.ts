import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { config } from '../config';

// One key object for the life of the process (per process by design: derived from JWT_SECRET, which every
// process shares); jsonwebtoken would otherwise build one on every check.
let key: { secret: string; object: KeyObject } | null = null;
function signingKey(): KeyObject {
  const secret = config().JWT_SECRET;
  if (key?.secret !== secret) key = { secret, object: createSecretKey(Buffer.from(secret, 'utf8')) };
  return key.object;
}

export const ACCESS_TOKEN_SECONDS = 15 * 60;

interface TokenClaims {
  sub: string;
  /** The user's token version when signed; raising it on the user ends every older token. */
  ver: number;
  /** The sign-in (row in auth_sessions) this token belongs to; ending it ends the token at once. */
  sid: string;
}

/**
 * The short-lived bearer token. Refresh tokens are not JWTs: they are opaque secrets whose hash lives in
 * auth_sessions, so they can rotate and a reused one can be recognised (see sessions.service.ts).
 */
export function signAccessToken(userId: string, tokenVersion: number, sessionId: string): string {
  return jwt.sign({ ver: tokenVersion, typ: 'access', sid: sessionId }, signingKey(), {
    subject: userId,
    expiresIn: ACCESS_TOKEN_SECONDS,
    algorithm: 'HS256',
    issuer: 'strapsift',
  });
}

/** Returns the claims of a valid access token, or null for anything expired, forged, malformed or of another kind. */
export function verifyAccessToken(token: string): TokenClaims | null {
  try {
    const claims = jwt.verify(token, signingKey(), { algorithms: ['HS256'], issuer: 'strapsift' });
    if (typeof claims !== 'object' || claims === null) return null;
    const { sub, ver, typ, sid } = claims as Partial<TokenClaims> & { typ?: unknown };
    if (typ !== 'access' || typeof sub !== 'string' || typeof ver !== 'number' || typeof sid !== 'string') return null;
    return { sub, ver, sid };
  } catch {
    return null;
  }
}
