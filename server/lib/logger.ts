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
 * An address as it may be logged: the secret part of share, invitation and reset links replaced, and
 * no query string at all (tokens travel there too).
 *
 * scrubUrl('/api/share/abc…/photos/1') → '/api/share/[redacted]/photos/1'
 */
export function scrubUrl(url: string): string {
  const [path = ''] = url.split('?');
  return path.replace(/\/(share|invite|invites)\/[^/]+/g, '/$1/[redacted]') + (url.includes('?') ? '?[redacted]' : '');
}
