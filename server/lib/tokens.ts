import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { config } from '../config';

// One key object for the life of the process: jsonwebtoken would otherwise build one on every check.
let key: { secret: string; object: KeyObject } | null = null;
function signingKey(): KeyObject {
  const secret = config().JWT_SECRET;
  if (key?.secret !== secret) key = { secret, object: createSecretKey(Buffer.from(secret, 'utf8')) };
  return key.object;
}

export const ACCESS_TOKEN_SECONDS = 15 * 60;
export const REFRESH_TOKEN_SECONDS = 30 * 24 * 60 * 60;

type TokenKind = 'access' | 'refresh';

interface TokenClaims {
  sub: string;
  /** The user's token version when signed; raising it on the user ends every older token. */
  ver: number;
  typ: TokenKind;
}

function sign(kind: TokenKind, userId: string, tokenVersion: number, seconds: number): string {
  return jwt.sign({ ver: tokenVersion, typ: kind }, signingKey(), {
    subject: userId,
    expiresIn: seconds,
    algorithm: 'HS256',
    issuer: 'strapsift',
  });
}

export const signAccessToken = (userId: string, tokenVersion: number) => sign('access', userId, tokenVersion, ACCESS_TOKEN_SECONDS);
export const signRefreshToken = (userId: string, tokenVersion: number) => sign('refresh', userId, tokenVersion, REFRESH_TOKEN_SECONDS);

/** Returns the claims of a valid token of the wanted kind, or null for anything expired, forged or malformed. */
export function verifyToken(token: string, kind: TokenKind): TokenClaims | null {
  try {
    const claims = jwt.verify(token, signingKey(), { algorithms: ['HS256'], issuer: 'strapsift' });
    if (typeof claims !== 'object' || claims === null) return null;
    const { sub, ver, typ } = claims as Partial<TokenClaims>;
    if (typ !== kind || typeof sub !== 'string' || typeof ver !== 'number') return null;
    return { sub, ver, typ };
  } catch {
    return null;
  }
}
