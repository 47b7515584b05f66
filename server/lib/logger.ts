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
