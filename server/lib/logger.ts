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
];

export const logger = pino({
  level: process.env.LOG_LEVEL ?? (process.env.NODE_ENV === 'test' ? 'silent' : 'info'),
  redact: { paths: redactedPaths, censor: '[redacted]' },
  base: { service: 'strapsift' },
});

/**
 * An address as it may be logged: the secret part of share and invitation links replaced, and the value
 * of any `token` in the query string (reset links) too.
 *
 * scrubUrl('/api/share/abc…/photos/1') → '/api/share/[redacted]/photos/1'
 */
export function scrubUrl(url: string): string {
  const [path = '', query] = url.split(/\?(.*)/s, 2);
  const safePath = path.replace(/\/(share|invite|invites)\/[^/]+/g, '/$1/[redacted]');
  return query === undefined ? safePath : `${safePath}?${query.replace(/(^|&)(token|refreshToken)=[^&]*/gi, '$1$2=[redacted]')}`;
}
