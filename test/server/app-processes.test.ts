import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { Writable } from 'node:stream';
import { promisify } from 'node:util';
import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/config';
import { serializeError } from '../../server/lib/logger';
import { openTestDataSource, testDatabaseUrl } from '../support/database';
import { ApiProcess, healthPid } from '../support/fault-rig';
import { waitForMail } from '../support/mail';

const run = promisify(execFile);
// Ports of their own, away from the served app and the load runs.
const base = Number(process.env.E2E_PORT ?? 8091) + 200;
const SECRET = 'two-process-test-secret-3f9a1c7e5b2d4680aa17';
const env = { DATABASE_URL: testDatabaseUrl(), JWT_SECRET: SECRET, NODE_ENV: 'test' };

async function call(baseUrl: string, method: string, path: string, body?: unknown, token?: string) {
  const response = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  return { status: response.status, headers: response.headers, body: text ? JSON.parse(text) : null };
}

describe('production fails closed', () => {
  const stripped = () => {
    const clean: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', LOG_LEVEL: 'silent' };
    for (const key of ['JWT_SECRET', 'DATABASE_URL', 'PUBLIC_URL', 'S3_ENDPOINT', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY']) delete clean[key];
    return clean;
  };

  it('when NODE_ENV=production and the secrets are missing, then the server refuses to start and names each one', async () => {
    const started = run(process.execPath, ['--import', 'tsx', 'server/main.ts'], { env: stripped(), timeout: 30_000 });
    const failure = (await started.then(
      () => null,
      (error: { code?: number; stderr?: string }) => error,
    )) as { code?: number; stderr?: string } | null;
    expect(failure?.code).toBe(1);
    for (const name of ['JWT_SECRET', 'DATABASE_URL', 'PUBLIC_URL', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY']) expect(failure?.stderr).toContain(name);
  }, 40_000);

  it('when the secret is short or one repeated character, or S3 keeps the stand-in keys, then the configuration is refused', () => {
    const good: NodeJS.ProcessEnv = {
      NODE_ENV: 'production',
      JWT_SECRET: 'c2FsdC1hbmQtcGVwcGVyLW9uLXRoZS1zdHJhcC0yMDI2LXJhbmRvbQ',
      DATABASE_URL: 'postgres://app@db.internal:5432/strapsift',
      PUBLIC_URL: 'https://strapsift.example.test',
      S3_ENDPOINT: 'https://objects.example.test',
      S3_ACCESS_KEY_ID: 'AKIDEXAMPLEKEY',
      S3_SECRET_ACCESS_KEY: 'example-secret-key-value',
    };
    expect(loadConfig(good).NODE_ENV).toBe('production');
    expect(() => loadConfig({ ...good, JWT_SECRET: 'a'.repeat(48) })).toThrow(/JWT_SECRET: looks like a repeated character/);
    expect(() => loadConfig({ ...good, JWT_SECRET: 'short-secret' })).toThrow(/JWT_SECRET/);
    expect(() => loadConfig({ ...good, S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' })).toThrow(/S3_ACCESS_KEY_ID[\s\S]*S3_SECRET_ACCESS_KEY/);
    expect(() => loadConfig({ ...good, NODE_ENV: 'development', JWT_SECRET: undefined, PUBLIC_URL: undefined, JWT_SECRET_FILE: '.data/jwt-secret' })).not.toThrow();
  });
});

describe('the log carries no secrets', () => {
  it('when a database error is logged, then neither its parameters nor the values PostgreSQL quotes reach the line', async () => {
    const dataSource = await openTestDataSource();
    const hash = '$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHQ$aGFzaGhhc2hoYXNo';
    const error = await dataSource.query('SELECT $1::int AS n', [hash]).catch((failure: unknown) => failure);
    await dataSource.destroy();
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _encoding, done) {
        lines.push(String(chunk));
        done();
      },
    });
    pino({ serializers: { err: serializeError } }, sink).error({ err: error }, 'unhandled error');
    expect(lines.join('')).toContain('22P02');
    expect(lines.join('')).not.toContain('argon2');
    expect(lines.join('')).not.toContain('parameters');
  });

  it('when a whole account life runs through a logging server, then no password, hash, token or mail body appears in its output', async () => {
    const server = new ApiProcess(base, { ...env, LOG_LEVEL: 'trace' }, { capture: true });
    await server.start();
    try {
      const email = `logged-${randomUUID().slice(0, 8)}@strapsift.test`;
      const password = 'never-in-the-log-7731';
      const session = (await call(server.baseUrl, 'POST', '/auth/register', { email, password, displayName: 'Logged Hunter' })).body;
      const login = (await call(server.baseUrl, 'POST', '/auth/login', { email, password })).body;
      const refreshed = (await call(server.baseUrl, 'POST', '/auth/refresh', { refreshToken: login.refreshToken })).body;
      await call(server.baseUrl, 'GET', `/keepers?query=${encodeURIComponent('private search words')}`, undefined, refreshed.token);
      await call(server.baseUrl, 'POST', '/auth/forgot', { email });
      const mail = await waitForMail(email, /reset/i);
      const resetToken = /token=([A-Za-z0-9_-]{43})/.exec(mail.text ?? '')![1]!;
      await call(server.baseUrl, 'POST', '/auth/reset', { token: resetToken, password: 'also-never-logged-2290' });
      await call(server.baseUrl, 'GET', `/invites/${resetToken}`);
      await call(server.baseUrl, 'POST', '/hunts', { title: 'bad\u0000title' }, refreshed.token);
      const [{ password_hash: hash }] = await (async () => {
        const dataSource = await openTestDataSource();
        try {
          return await dataSource.query('SELECT password_hash FROM users WHERE email = $1', [email]);
        } finally {
          await dataSource.destroy();
        }
      })();
      await new Promise((done) => setTimeout(done, 300));

      const output = server.output.join('');
      expect(output).toContain('request completed');
      for (const secret of [password, 'also-never-logged-2290', hash, session.token, session.refreshToken, login.token, login.refreshToken, refreshed.refreshToken, resetToken, 'private search words', 'private%20search']) {
        expect(output).not.toContain(secret);
      }
      expect(output).not.toMatch(/\$argon2/);
      expect(output).not.toContain('choose a new password');
      expect(output).not.toMatch(/eyJ[A-Za-z0-9_-]{10,}\.[A-Za-z0-9_-]{10,}/);
    } finally {
      await server.stop('SIGTERM');
    }
  }, 60_000);
});

describe('two app processes on two ports, one database', () => {
  const a = new ApiProcess(base + 1, env);
  const b = new ApiProcess(base + 2, env);
  beforeAll(async () => {
    await Promise.all([a.start(), b.start()]);
  }, 60_000);
  afterAll(async () => {
    await Promise.all([a.stop('SIGTERM'), b.stop('SIGTERM')]);
  });

  it('when a client alternates between them, then a token from one works on the other, notes are stored once, and sign-in limits are shared', async () => {
    const [healthA, healthB] = await Promise.all([call(a.baseUrl, 'GET', '/health'), call(b.baseUrl, 'GET', '/health')]);
    expect(healthA.body.pid).not.toBe(healthB.body.pid);

    const email = `two-${randomUUID().slice(0, 8)}@strapsift.test`;
    const password = 'one-database-two-apps';
    const session = (await call(a.baseUrl, 'POST', '/auth/register', { email, password, displayName: 'Two Ports' })).body;
    expect((await call(b.baseUrl, 'GET', '/me', undefined, session.token)).body.email).toBe(email);
    const hunt = (await call(b.baseUrl, 'POST', '/hunts', { title: 'Split box', source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 2 }, session.token)).body;
    // A refresh on one process is a rotation for both: the old refresh token is dead on the other.
    const rotated = (await call(b.baseUrl, 'POST', '/auth/refresh', { refreshToken: session.refreshToken })).body;
    const dataSource = await openTestDataSource();
    // Past the 30-second grace for simultaneous refreshes.
    await dataSource.query(`UPDATE auth_sessions SET rotated_at = now() - interval '1 minute' WHERE id = $1`, [rotated.refreshToken.split('.')[0]]);
    await dataSource.destroy();
    expect((await call(a.baseUrl, 'POST', '/auth/refresh', { refreshToken: session.refreshToken })).status).toBe(401);
    expect((await call(a.baseUrl, 'GET', '/me', undefined, rotated.token)).status).toBe(401);

    const fresh = (await call(a.baseUrl, 'POST', '/auth/login', { email, password })).body;
    const scans = Array.from({ length: 40 }, (_, index) => ({
      id: randomUUID(),
      huntId: hunt.id,
      strap: 1,
      serial: String(52_000_000 + index * 7),
      scannedAt: new Date(Date.parse('2026-11-02T10:00:00Z') + index * 1000).toISOString(),
    }));
    // The same batch through both processes at once, twice: each note once.
    await Promise.all([a, b, a, b].map((server) => call(server.baseUrl, 'POST', '/scans/batch', { scans }, fresh.token)));
    const page = (await call(b.baseUrl, 'GET', `/hunts/${hunt.id}/scans?limit=200`, undefined, fresh.token)).body;
    expect(page.items).toHaveLength(40);

    const statuses: number[] = [];
    for (let attempt = 0; attempt < 11; attempt++) {
      const server = attempt % 2 === 0 ? a : b;
      statuses.push((await call(server.baseUrl, 'POST', '/auth/login', { email, password: `wrong-${attempt}-password` })).status);
    }
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(statuses[10]).toBe(429);
    const right = await call(b.baseUrl, 'POST', '/auth/login', { email, password });
    expect(right.status).toBe(429);
    expect(Number(right.headers.get('retry-after'))).toBeGreaterThan(0);
  }, 60_000);
});

describe('npm start runs WORKERS processes with node:cluster', () => {
  it('when a worker is killed, then another takes its place and the death is logged; SIGTERM stops them all', async () => {
    const clustered = new ApiProcess(base + 3, { ...env, WORKERS: '2', LOG_LEVEL: 'info' }, { script: 'server/cluster.ts', capture: true });
    await clustered.start();
    try {
      const pids = new Set<number>();
      for (let attempt = 0; attempt < 200 && pids.size < 2; attempt++) {
        const pid = await healthPid(clustered.baseUrl);
        if (pid) pids.add(pid);
        else await new Promise((done) => setTimeout(done, 100));
      }
      expect(pids.size).toBe(2);
      const [victim] = [...pids];
      process.kill(victim!, 'SIGKILL');
      const deadline = Date.now() + 20_000;
      let replaced = false;
      while (!replaced && Date.now() < deadline) {
        await new Promise((done) => setTimeout(done, 200));
        const seen = new Set<number>();
        for (let attempt = 0; attempt < 10; attempt++) {
          const pid = await healthPid(clustered.baseUrl);
          if (pid) seen.add(pid);
        }
        replaced = [...seen].some((pid) => !pids.has(pid));
      }
      expect(replaced).toBe(true);
      expect(clustered.output.join('')).toContain('an app process died; starting another');
    } finally {
      await clustered.stop('SIGTERM');
    }
    expect(clustered.output.join('')).toContain('stopping every app process');
  }, 60_000);
});
