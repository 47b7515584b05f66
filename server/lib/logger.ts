import pino from 'pino';

// Secrets must never reach a log line, whatever a caller passes in.
export const redactedPaths = [
  'req.headers.authorization',
  'req.headers.cookie',
  'password',
  'passwordHash',
  'token',
  '*.password',
  '*.passwordHash',
  '*.token',
  'refreshToken',
  '*.refreshToken',
  '*.currentPassword',
  '*.newPassword',
];

/**
 * Errors as they may be logged. A TypeORM QueryFailedError carries the statement's parameters (a password
 * hash, a token, a mail body) and the driver's detail quotes values too ("Key (email)=(…)"): only the
 * class, the message, the SQL state, the constraint, the statement text and the stack are kept.
 */
export function serializeError(error: unknown): Record<string, unknown> {
  if (!(error instanceof Error)) return { message: String(error) };
  const failure = error as Error & { code?: unknown; constraint?: unknown; query?: unknown; driverError?: { code?: unknown; constraint?: unknown } };
  // PostgreSQL quotes the offending value in some messages ('invalid input syntax for type integer: "…"').
  const fromDatabase = typeof failure.query === 'string' || failure.driverError !== undefined;
  const message = fromDatabase ? error.message.replace(/"[^"]*"/g, '"[value]"') : error.message;
  return {
    type: error.name,
    message,
    code: failure.code ?? failure.driverError?.code,
    constraint: failure.constraint ?? failure.driverError?.constraint,
    query: typeof failure.query === 'string' ? failure.query.slice(0, 500) : undefined,
    // The stack's first line repeats the message.
    stack: error.stack?.replace(error.message, message),
  };
}

export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
  redact: { paths: redactedPaths, censor: '[redacted]' },
  base: { service: 'strapsift', pid: process.pid },
  serializers: { err: serializeError, error: serializeError },
});

/**
 * An address as it may be logged: the secret part of share and invitation links replaced, and the value
 * of any `token` in the query string (reset links) too, and of searches and addresses a hunter typed.
 *
 * scrubUrl('/api/share/abc…/photos/1') → '/api/share/[redacted]/photos/1'
 */
export function scrubUrl(url: string): string {
  const [path = '', query] = url.split(/\?(.*)/s, 2);
  const safePath = path.replace(/\/(share|invite|invites)\/[^/]+/g, '/$1/[redacted]');
  return query === undefined ? safePath : `${safePath}?${query.replace(/(^|&)(token|refreshToken|email|query|q)=[^&]*/gi, '$1$2=[redacted]')}`;
}
