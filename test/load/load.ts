/**
 * npm run load: 50 simulated hunters against the real API on 127.0.0.1 for a fixed time (autocannon),
 * then the long fault run (10,000 notes through two API kills and a PostgreSQL restart).
 * Figures are printed and written to docs/PERFORMANCE.md ("## Load") and docs/RELIABILITY.md ("## Measured").
 * Options: --seconds N (default 20), --rate R requests a second per hunter (default 10), --no-faults, --no-write.
 */
import autocannon from 'autocannon';
import { randomUUID } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import { resolve } from 'node:path';
import { createDataSource } from '../../server/db/data-source';
import { ApiProcess } from '../support/fault-rig';
import { runFaultScenario, type FaultOutcome } from '../support/fault-scenario';

const root = resolve(__dirname, '../..');
const args = process.argv.slice(2);
const seconds = Number(args[args.indexOf('--seconds') + 1]) || 20;
const write = !args.includes('--no-write');
const HUNTERS = 50;
const RATE_PER_HUNTER = Number(args[args.indexOf('--rate') + 1]) || 10;
const PGPORT = Number(process.env.PGPORT ?? 54329);
const DB = 'strapsift_load';

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function post(url: string, body: unknown, token?: string) {
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}) },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${url}: ${response.status} ${await response.text()}`);
  return response.json();
}

async function freshDatabase(): Promise<string> {
  const admin = createDataSource(`postgres://postgres@127.0.0.1:${PGPORT}/postgres`);
  await admin.initialize();
  await admin.query(`DROP DATABASE IF EXISTS ${DB} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${DB}`);
  await admin.destroy();
  const url = `postgres://postgres@127.0.0.1:${PGPORT}/${DB}`;
  const migrator = createDataSource(url);
  await migrator.initialize();
  await migrator.runMigrations();
  await migrator.destroy();
  return url;
}

interface LoadFigures {
  seconds: number;
  requests: number;
  perSecond: number;
  errors: number;
  non2xx: number;
  signIn: { p50: number; p95: number };
  all: { p50: number; p95: number; p99: number };
  byKind: Record<string, { count: number; p50: number; p95: number; p99: number }>;
}

async function runLoad(): Promise<LoadFigures> {
  const url = await freshDatabase();
  const api = new ApiProcess(8199, { DATABASE_URL: url, JWT_SECRET: 'load-run-secret-0123456789-abcdefghijklmnopq', NODE_ENV: 'production' });
  await api.start();
  try {
    // Each hunter signs up once, then signs in as a returning hunter would; sign-in is timed on its own
    // because argon2 is deliberately slow.
    const hunters = await Promise.all(
      Array.from({ length: HUNTERS }, async (_, index) => {
        const email = `load-${index}-${randomUUID().slice(0, 6)}@strapsift.test`;
        await post(`${api.baseUrl}/api/auth/register`, { email, password: 'load-run-password', displayName: `Load ${index}` });
        return { email };
      }),
    );
    const signInTimes: number[] = [];
    const sessions = await Promise.all(
      hunters.map(async ({ email }, index) => {
        const started = performance.now();
        const session = await post(`${api.baseUrl}/api/auth/login`, { email, password: 'load-run-password' });
        signInTimes.push(performance.now() - started);
        const hunt = await post(`${api.baseUrl}/api/hunts`, { title: `Load hunt ${index}`, source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 400 }, session.token);
        return { token: session.token as string, huntId: hunt.id as string, index };
      }),
    );

    const latencies: Record<string, number[]> = { batch: [], hunts: [], tally: [], straps: [] };
    let next = 0;
    const result = await autocannon({
      url: api.baseUrl,
      connections: HUNTERS,
      // A hunter with the app open sends far less than this; 10 requests a second each (500 a second in
      // all) is a deliberately heavy pace that still leaves room to measure latency instead of a queue.
      connectionRate: RATE_PER_HUNTER,
      duration: seconds,
      setupClient(client) {
        const hunter = sessions[next++ % sessions.length];
        let serial = 20_000_000 + hunter.index * 100_000;
        const kinds: string[] = [];
        client.setHeaders({ authorization: `Bearer ${hunter.token}`, 'content-type': 'application/json' });
        client.setRequests([
          {
            method: 'POST',
            path: '/api/scans/batch',
            setupRequest(request) {
              kinds.push('batch');
              const scans = Array.from({ length: 20 }, () => ({
                id: randomUUID(),
                huntId: hunter.huntId,
                strap: 1 + Math.floor((serial - 20_000_000 - hunter.index * 100_000) / 100),
                serial: String((serial += 1)),
                scannedAt: new Date().toISOString(),
              }));
              return { ...request, body: JSON.stringify({ scans }) };
            },
          },
          { method: 'GET', path: '/api/hunts', setupRequest: (request) => (kinds.push('hunts'), request) },
          { method: 'GET', path: `/api/hunts/${hunter.huntId}/tally`, setupRequest: (request) => (kinds.push('tally'), request) },
          { method: 'GET', path: `/api/hunts/${hunter.huntId}/straps`, setupRequest: (request) => (kinds.push('straps'), request) },
        ]);
        client.on('response', (_status: number, _bytes: number, responseTime: number) => {
          const kind = kinds.shift() ?? 'other';
          (latencies[kind] ??= []).push(responseTime);
        });
      },
    });
    const all = Object.values(latencies).flat().sort((a, b) => a - b);
    const byKind: LoadFigures['byKind'] = {};
    for (const [kind, values] of Object.entries(latencies)) {
      const sorted = [...values].sort((a, b) => a - b);
      byKind[kind] = { count: sorted.length, p50: percentile(sorted, 50), p95: percentile(sorted, 95), p99: percentile(sorted, 99) };
    }
    const signIn = [...signInTimes].sort((a, b) => a - b);
    return {
      seconds,
      requests: result.requests.total,
      perSecond: result.requests.average,
      errors: result.errors + result.timeouts,
      non2xx: result.non2xx,
      signIn: { p50: percentile(signIn, 50), p95: percentile(signIn, 95) },
      all: { p50: percentile(all, 50), p95: percentile(all, 95), p99: percentile(all, 99) },
      byKind,
    };
  } finally {
    await api.stop();
  }
}

const ms = (n: number) => `${n.toFixed(1)} ms`;

function replaceSection(file: string, heading: string, body: string): void {
  const path = resolve(root, file);
  const text = existsSync(path) ? readFileSync(path, 'utf8') : `# ${file.replace(/^docs\//, '').replace('.md', '')}\n`;
  const start = text.indexOf(`\n${heading}\n`);
  let next: string;
  if (start === -1) next = `${text.trimEnd()}\n\n${heading}\n${body}`;
  else {
    const after = text.indexOf('\n## ', start + heading.length + 1);
    next = `${text.slice(0, start)}\n${heading}\n${body}${after === -1 ? '' : text.slice(after)}`;
  }
  writeFileSync(path, `${next.trimEnd()}\n`);
}

async function main(): Promise<void> {
  const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'cpu'}, Node ${process.version}, load average ${os.loadavg()[0].toFixed(1)} at start`;
  console.error(`load: ${HUNTERS} hunters for ${seconds} s against 127.0.0.1 …`);
  const load = await runLoad();
  console.log(JSON.stringify(load, null, 2));
  let faults: FaultOutcome | null = null;
  if (!args.includes('--no-faults')) {
    console.error('faults: 20 hunters, 10,000 notes, API killed twice, PostgreSQL restarted once …');
    faults = await runFaultScenario({ clients: 20, totalScans: 10_000, apiPort: 8198, pgPort: 54398 });
    console.log(JSON.stringify(faults, null, 2));
  }
  if (!write) return;
  const date = new Date().toISOString().slice(0, 10);
  const rows = Object.entries(load.byKind)
    .map(([kind, f]) => `| ${kind} | ${f.count.toLocaleString('en-US')} | ${ms(f.p50)} | ${ms(f.p95)} | ${ms(f.p99)} |`)
    .join('\n');
  replaceSection(
    'docs/PERFORMANCE.md',
    '## Load',
    [
      '',
      `Measured ${date} by \`npm run load\` (test/load/load.ts): ${HUNTERS} simulated hunters, one autocannon connection each at ${RATE_PER_HUNTER} requests a second (${HUNTERS * RATE_PER_HUNTER} a second offered), for ${load.seconds} s against the API process on 127.0.0.1 (${machine}). The load generator shares the 2 cores with the server and PostgreSQL.`,
      '',
      `- Throughput: ${load.requests.toLocaleString('en-US')} requests, ${load.perSecond.toFixed(0)} per second; errors ${load.errors}, non-2xx ${load.non2xx}.`,
      `- All requests: p50 ${ms(load.all.p50)}, p95 ${ms(load.all.p95)}, p99 ${ms(load.all.p99)} (target p95 ≤ 50 ms: ${load.all.p95 <= 50 ? 'met' : 'not met'}).`,
      `- Sign-in (argon2id, timed apart from the loop): p50 ${ms(load.signIn.p50)}, p95 ${ms(load.signIn.p95)}.`,
      '',
      '| request | count | p50 | p95 | p99 |',
      '| --- | --- | --- | --- | --- |',
      rows,
      '',
      'A batch is 20 new notes; hunts is the hunt list; tally and straps are the hunter’s own hunt.',
      '',
    ].join('\n'),
  );
  if (faults) {
    replaceSection(
      'docs/RELIABILITY.md',
      '## Measured by npm run load',
      [
        '',
        `${date}: ${faults.clients} simulated hunters sent ${faults.sent.toLocaleString('en-US')} notes through the app's own offline queue while the API process was killed ${faults.apiRestarts} times and PostgreSQL restarted ${faults.databaseRestarts} time. Stored ${faults.stored.toLocaleString('en-US')}, distinct ${faults.distinct.toLocaleString('en-US')}: ${faults.lost} lost, ${faults.doubled} doubled. ${faults.failedCalls} upload calls failed during the crashes and were retried. Run time ${faults.seconds.toFixed(1)} s.`,
        '',
      ].join('\n'),
    );
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
