/**
 * npm run load: 50 simulated hunters against the real API on 127.0.0.1, run as npm start runs it (WORKERS
 * processes under node:cluster): 50 simultaneous sign-ins, a paced mixed load, the ceiling (autocannon) with
 * WORKERS processes and with one for comparison, then the long fault run (10,000 notes while one worker is
 * killed twice and PostgreSQL restarted once).
 * Figures are printed and written to docs/PERFORMANCE.md ("## Load") and docs/RELIABILITY.md ("## Measured").
 * Options: --seconds N (default 20), --rate R requests a second per hunter (default 6, so 300 a second),
 * --workers N (default 2), --no-faults, --no-write.
 */
import autocannon from 'autocannon';
import { randomUUID } from 'node:crypto';
import os from 'node:os';
import { resolve } from 'node:path';
import { readFlags, wholeFlag } from '../../scripts/lib/cli-flags';
import { ApiProcess } from '../support/fault-rig';
import { writeDocSection } from '../support/doc-section';
import { runFaultScenario, type FaultOutcome } from '../support/fault-scenario';
import { freshDatabase, percentile, post } from './rig';
import { pacedHunters } from './paced-hunters';

const root = resolve(__dirname, '../..');
const USAGE = `usage: npm run load -- [options]

  --seconds N     how long the load run lasts (default 20)
  --rate R        requests a second per hunter (default 6, so 300 a second)
  --workers N     app processes behind the port (default 2)
  --no-faults     skip the fault run (API kills, PostgreSQL restart)
  --no-write      print the figures only; leave docs/ alone
  --help          this text`;
const flags = readFlags(
  process.argv.slice(2),
  { seconds: { type: 'string' }, rate: { type: 'string' }, workers: { type: 'string' }, 'no-faults': { type: 'boolean' }, 'no-write': { type: 'boolean' } },
  USAGE,
);
const seconds = wholeFlag(flags.seconds, 20, 'seconds', USAGE);
const write = !flags['no-write'];
const HUNTERS = 50;
const RATE_PER_HUNTER = wholeFlag(flags.rate, 6, 'rate', USAGE);
const WORKERS = wholeFlag(flags.workers, 2, 'workers', USAGE);
const DB = 'strapsift_load';

interface LoadFigures {
  seconds: number;
  requests: number;
  perSecond: number;
  errors: number;
  non2xx: number;
  signIn: { p50: number; p95: number };
  all: { p50: number; p95: number; p99: number };
  byKind: Record<string, { count: number; p50: number; p95: number; p99: number }>;
  ceiling: Ceiling;
  oneProcess: Ceiling;
}

interface Ceiling {
  perSecond: number;
  p50: number;
  p95: number;
  errors: number;
  non2xx: number;
}

type Session = { token: string; huntId: string; index: number };

/** autocannon: 50 connections, each sending the mix again as soon as an answer comes back. */
async function measureCeiling(baseUrl: string, sessions: Session[], duration: number): Promise<Ceiling> {
    const closedLoop: Record<string, number[]> = { batch: [], hunts: [], tally: [], straps: [] };
    let next = 0;
    const result = await autocannon({
      url: baseUrl,
      connections: HUNTERS,
      duration,
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
          (closedLoop[kind] ??= []).push(responseTime);
        });
      },
    });
  const closedAll = Object.values(closedLoop).flat().sort((a, b) => a - b);
  return {
    perSecond: result.requests.average,
    p50: percentile(closedAll, 50),
    p95: percentile(closedAll, 95),
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
  };
}

/** The API as production runs it: NODE_ENV=production (so every setting must be given) behind a balancer on loopback. */
function apiProcess(url: string, workers: number): ApiProcess {
  return new ApiProcess(
    8199,
    {
      DATABASE_URL: url,
      JWT_SECRET: 'load-run-secret-0123456789-abcdefghijklmnopq',
      NODE_ENV: 'production',
      PUBLIC_URL: 'http://127.0.0.1:8199',
      S3_ENDPOINT: 'http://127.0.0.1:9',
      S3_ACCESS_KEY_ID: 'load-run-key',
      S3_SECRET_ACCESS_KEY: 'load-run-secret-key',
      // Each simulated hunter comes from its own address, as X-Forwarded-For from a balancer on loopback says.
      TRUSTED_PROXIES: '127.0.0.1',
      WORKERS: String(workers),
    },
    { script: 'server/cluster.ts' },
  );
}

/** Phase starts on stderr with the time, so a CPU sampler running beside can be read phase by phase. */
const phase = (name: string) => console.error(`${new Date().toISOString().slice(11, 19)} ${name} …`);

const hunterAddress = (index: number) => `10.1.${Math.floor(index / 250)}.${(index % 250) + 1}`;

async function runLoad(): Promise<LoadFigures> {
  const url = await freshDatabase(DB);
  const api = apiProcess(url, WORKERS);
  await api.start();
  try {
    // Each hunter signs up once, then signs in as a returning hunter would; sign-in is timed on its own
    // because argon2 is deliberately slow.
    const hunters = await Promise.all(
      Array.from({ length: HUNTERS }, async (_, index) => {
        const email = `load-${index}-${randomUUID().slice(0, 6)}@strapsift.test`;
        await post(`${api.baseUrl}/api/auth/register`, { email, password: 'load-run-password', displayName: `Load ${index}` }, undefined, hunterAddress(index));
        return { email };
      }),
    );
    const signInTimes: number[] = [];
    const sessions = await Promise.all(
      hunters.map(async ({ email }, index) => {
        const started = performance.now();
        const session = await post(`${api.baseUrl}/api/auth/login`, { email, password: 'load-run-password' }, undefined, hunterAddress(index));
        signInTimes.push(performance.now() - started);
        const hunt = await post(`${api.baseUrl}/api/hunts`, { title: `Load hunt ${index}`, source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 400 }, session.token);
        return { token: session.token as string, huntId: hunt.id as string, index };
      }),
    );

    // Three seconds unmeasured first: the server's JIT warms up and the sign-ins' hashing has drained.
    await pacedHunters(api.baseUrl, sessions, RATE_PER_HUNTER, 3000);
    phase(`paced mix, ${HUNTERS * RATE_PER_HUNTER} a second offered`);
    const paced = await pacedHunters(api.baseUrl, sessions, RATE_PER_HUNTER, seconds * 1000);
    const latencies = paced.latencies;
    // Then the ceiling: the same mix with every connection sending as fast as answers come back.
    phase(`ceiling with ${WORKERS} processes`);
    const ceiling = await measureCeiling(api.baseUrl, sessions, Math.min(10, seconds));
    // The same ceiling with one process on the same database and sessions, to see what the second one buys.
    await api.stop('SIGTERM');
    const single = apiProcess(url, 1);
    await single.start();
    // Warmed up like the first: without it the one-process figure also paid for a cold JIT and pool.
    await pacedHunters(single.baseUrl, sessions, RATE_PER_HUNTER, 3000);
    phase('ceiling with one process');
    const oneProcess = await measureCeiling(single.baseUrl, sessions, Math.min(10, seconds)).finally(() => single.stop('SIGTERM'));
    const all = Object.values(latencies).flat().sort((a, b) => a - b);
    const byKind: LoadFigures['byKind'] = {};
    for (const [kind, values] of Object.entries(latencies)) {
      const sorted = [...values].sort((a, b) => a - b);
      byKind[kind] = { count: sorted.length, p50: percentile(sorted, 50), p95: percentile(sorted, 95), p99: percentile(sorted, 99) };
    }
    const signIn = [...signInTimes].sort((a, b) => a - b);
    return {
      seconds,
      requests: paced.requests,
      perSecond: paced.requests / seconds,
      errors: paced.failures + ceiling.errors + oneProcess.errors,
      non2xx: ceiling.non2xx + oneProcess.non2xx,
      ceiling,
      oneProcess,
      signIn: { p50: percentile(signIn, 50), p95: percentile(signIn, 95) },
      all: { p50: percentile(all, 50), p95: percentile(all, 95), p99: percentile(all, 99) },
      byKind,
    };
  } finally {
    await api.stop();
  }
}

const ms = (n: number) => `${n.toFixed(1)} ms`;

async function main(): Promise<void> {
  const machine = `${os.cpus().length} × ${os.cpus()[0]?.model ?? 'cpu'}, Node ${process.version}, load average ${os.loadavg()[0].toFixed(1)} at start`;
  console.error(`load: ${HUNTERS} hunters for ${seconds} s against ${WORKERS} app processes on 127.0.0.1 …`);
  const load = await runLoad();
  console.log(JSON.stringify(load, null, 2));
  let faults: FaultOutcome | null = null;
  if (!flags['no-faults']) {
    phase('faults');
    console.error(`faults: 20 hunters, 10,000 notes, ${WORKERS} app processes, one worker killed twice, PostgreSQL restarted once …`);
    faults = await runFaultScenario({ clients: 20, totalScans: 10_000, apiPort: 8198, pgPort: 54398, workers: WORKERS });
    console.log(JSON.stringify(faults, null, 2));
  }
  if (!write) return;
  const date = new Date().toISOString().slice(0, 10);
  const rows = Object.entries(load.byKind)
    .map(([kind, f]) => `| ${kind} | ${f.count.toLocaleString('en-US')} | ${ms(f.p50)} | ${ms(f.p95)} | ${ms(f.p99)} |`)
    .join('\n');
  const gain = load.ceiling.perSecond / load.oneProcess.perSecond;
  writeDocSection(
    resolve(root, 'docs/PERFORMANCE.md'),
    [
      '## Load',
      '',
      `Measured ${date} by \`npm run load\` (test/load/load.ts) against the API as \`npm start\` runs it: server/cluster.ts with WORKERS=${WORKERS} app processes on one port, NODE_ENV=production, on 127.0.0.1 (${machine}). The load generator shares the 2 cores with the app processes and PostgreSQL. ${HUNTERS} simulated hunters, each from its own address (X-Forwarded-For from a trusted proxy on loopback), each send a request every ${(1000 / RATE_PER_HUNTER).toFixed(0)} ms for ${load.seconds} s (${HUNTERS * RATE_PER_HUNTER} a second offered), cycling through a batch of 20 new notes, the hunt list, their hunt's tally and its strap sheet; each request is timed from send to last byte.`,
      '',
      `- Throughput: ${load.requests.toLocaleString('en-US')} requests, ${load.perSecond.toFixed(0)} per second; errors ${load.errors}, non-2xx ${load.non2xx}.`,
      `- All requests at ${HUNTERS * RATE_PER_HUNTER} a second: p50 ${ms(load.all.p50)}, p95 ${ms(load.all.p95)}, p99 ${ms(load.all.p99)} (target p95 ≤ 50 ms at 300 a second: ${load.all.p95 <= 50 && HUNTERS * RATE_PER_HUNTER >= 300 ? 'met' : 'not met'}).`,
      `- Sign-in, all 50 at the same moment (argon2id m = 19 MiB, t = 2, p = 1 on libuv's pool, timed apart from the loop): p50 ${ms(load.signIn.p50)}, p95 ${ms(load.signIn.p95)} (target p95 ≤ 2 s: ${load.signIn.p95 <= 2000 ? 'met' : 'not met'}).`,
      `- Ceiling with ${WORKERS} processes (autocannon, 50 connections sending as fast as answers come back, same mix, ${Math.min(10, load.seconds)} s): ${load.ceiling.perSecond.toFixed(0)} requests a second, p50 ${ms(load.ceiling.p50)}, p95 ${ms(load.ceiling.p95)} (target ≥ 700: ${load.ceiling.perSecond >= 700 ? 'met' : 'not met'}).`,
      `- The same ceiling with one process, same database and sessions, after the same 3 s warm-up: ${load.oneProcess.perSecond.toFixed(0)} requests a second, p50 ${ms(load.oneProcess.p50)}, p95 ${ms(load.oneProcess.p95)}. ${WORKERS} processes give ×${gain.toFixed(2)}.`,
      '',
      '| request | count | p50 | p95 | p99 |',
      '| --- | --- | --- | --- | --- |',
      rows,
      '',
      'A batch is 20 new notes; hunts is the hunt list; tally and straps are the hunter’s own hunt.',
      '',
    ].join('\n'),
    'Performance',
  );
  if (faults) {
    writeDocSection(
      resolve(root, 'docs/RELIABILITY.md'),
      [
        '## Measured by npm run load',
        '',
        `${date}: ${faults.clients} simulated hunters sent ${faults.sent.toLocaleString('en-US')} notes through the app's own offline queue to ${WORKERS} app processes (server/cluster.ts) while one worker was killed ${faults.apiRestarts} times (the cluster started a new one each time) and PostgreSQL restarted ${faults.databaseRestarts} time. Stored ${faults.stored.toLocaleString('en-US')}, distinct ${faults.distinct.toLocaleString('en-US')}: ${faults.lost} lost, ${faults.doubled} doubled. ${faults.failedCalls} upload calls failed during the crashes and were retried. Run time ${faults.seconds.toFixed(1)} s.`,
        '',
      ].join('\n'),
      'Reliability',
    );
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
