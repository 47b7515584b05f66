import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { z } from 'zod';

const configSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  HOST: z.string().min(1).default('127.0.0.1'),
  PORT: z.coerce.number().int().min(1).max(65535).default(8080),
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'must be a postgres:// connection URL')
    .default('postgres://postgres@127.0.0.1:54329/strapsift'),
  JWT_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  JWT_SECRET_FILE: z.string().default('.data/jwt-secret'),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  WEB_DIST: z.string().default('dist'),
  PUBLIC_URL: z.string().url().optional(),
  // Photos go to S3 through the AWS SDK; locally that is the s3rver fake that scripts/fakes.ts starts.
  S3_ENDPOINT: z.string().url().default('http://127.0.0.1:4569'),
  S3_REGION: z.string().min(1).default('us-east-1'),
  S3_BUCKET: z.string().min(3).default('strapsift-photos'),
  S3_ACCESS_KEY_ID: z.string().min(1).default('S3RVER'),
  S3_SECRET_ACCESS_KEY: z.string().min(1).default('S3RVER'),
  S3_FORCE_PATH_STYLE: z.enum(['true', 'false']).default('true'),
  // Mail goes over SMTP with nodemailer; locally to the mail catcher.
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  SMTP_SECURE: z.enum(['true', 'false']).default('false'),
  SMTP_USER: z.string().optional(),
  SMTP_PASSWORD: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Strapsift <no-reply@strapsift.test>'),
  // Comma-separated addresses or subnets of the proxies in front of the app (load balancer); their
  // X-Forwarded-For is believed. Empty: the socket's address is the client's.
  TRUSTED_PROXIES: z
    .string()
    .default('')
    .transform((value) => value.split(',').map((item) => item.trim()).filter(Boolean)),
  // App processes npm start runs (node:cluster); 0 means one per core.
  WORKERS: z.coerce.number().int().min(0).max(64).default(0),
  // A client that sends its headers or body too slowly is cut off, so slow clients cannot hold sockets.
  HEADERS_TIMEOUT_MS: z.coerce.number().int().min(1000).default(20_000),
  REQUEST_TIMEOUT_MS: z.coerce.number().int().min(1000).default(120_000),
});

export type Config = Omit<z.infer<typeof configSchema>, 'JWT_SECRET' | 'JWT_SECRET_FILE'> & {
  JWT_SECRET: string;
  PUBLIC_URL: string;
};

export class ConfigError extends Error {}

/**
 * Reads the environment once and fails with every problem listed, so a bad start
 * says what to fix instead of crashing later on the first request that needs it.
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = configSchema.safeParse(env);
  const lines = parsed.success ? [] : parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
  if (env.NODE_ENV === 'production') lines.push(...productionProblems(env).filter((line) => !lines.some((seen) => seen.split(':')[0] === line.split(':')[0])));
  if (!parsed.success || lines.length) {
    throw new ConfigError(`Strapsift cannot start; fix these settings:\n${lines.map((line) => `  ${line}`).join('\n')}`);
  }
  const values = parsed.data;
  return {
    ...values,
    JWT_SECRET: values.JWT_SECRET ?? developmentSecret(values.JWT_SECRET_FILE),
    PUBLIC_URL: values.PUBLIC_URL ?? `http://${values.HOST}:${values.PORT}`,
  };
}

/** The local stand-in's credentials; a production server must never run with them. */
const FAKE_S3_KEYS = new Set(['S3RVER']);

/**
 * Production fails closed: every setting whose default only suits a developer machine must be given,
 * and the token secret must be long and not a repeated character.
 */
export function productionProblems(env: NodeJS.ProcessEnv): string[] {
  const problems: string[] = [];
  const secret = env.JWT_SECRET ?? '';
  if (!secret) problems.push('JWT_SECRET: is required (at least 32 random bytes, e.g. `openssl rand -base64 48`)');
  else if (Buffer.byteLength(secret, 'utf8') < 32) problems.push('JWT_SECRET: must be at least 32 bytes');
  else if (new Set(secret).size < 8) problems.push('JWT_SECRET: looks like a repeated character, not random bytes');
  if (!env.DATABASE_URL) problems.push('DATABASE_URL: is required');
  if (!env.PUBLIC_URL) problems.push('PUBLIC_URL: is required (the address users open, used in mailed links)');
  if (!env.S3_ENDPOINT) problems.push('S3_ENDPOINT: is required');
  if (!env.S3_ACCESS_KEY_ID || FAKE_S3_KEYS.has(env.S3_ACCESS_KEY_ID)) problems.push('S3_ACCESS_KEY_ID: real object-store credentials are required');
  if (!env.S3_SECRET_ACCESS_KEY || FAKE_S3_KEYS.has(env.S3_SECRET_ACCESS_KEY)) problems.push('S3_SECRET_ACCESS_KEY: real object-store credentials are required');
  return problems;
}

// A developer machine gets a random secret kept out of git, so no secret is ever committed
// and tokens survive a restart.
function developmentSecret(file: string): string {
  const path = resolve(file);
  if (existsSync(path)) {
    const stored = readFileSync(path, 'utf8').trim();
    if (stored.length >= 32) return stored;
  }
  const secret = randomBytes(48).toString('base64url');
  mkdirSync(dirname(path), { recursive: true });
  writeFileSync(path, `${secret}\n`, { mode: 0o600 });
  return secret;
}

// Per process by design: read from the environment, the same in every process.
let cached: Config | undefined;

export function config(): Config {
  cached ??= loadConfig();
  return cached;
}
