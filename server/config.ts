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
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `  ${issue.path.join('.')}: ${issue.message}`);
    throw new ConfigError(`Strapsift cannot start; fix these settings:\n${lines.join('\n')}`);
  }
  const values = parsed.data;
  return {
    ...values,
    JWT_SECRET: values.JWT_SECRET ?? developmentSecret(values.JWT_SECRET_FILE),
    PUBLIC_URL: values.PUBLIC_URL ?? `http://${values.HOST}:${values.PORT}`,
  };
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

let cached: Config | undefined;

export function config(): Config {
  cached ??= loadConfig();
  return cached;
}
