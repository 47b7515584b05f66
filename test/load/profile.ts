/**
 * Where one app process spends a request: runs server/main.ts alone (NODE_ENV=production) with
 * a CPU profiler and a SQL counter preloaded (test/load/probe.mjs), then
 *  1. sends 100 requests of each type of the load mix on its own and prints the SQL statements each
 *     request sent (count and time waiting for PostgreSQL per request);
 *  2. runs the paced mix (50 hunters) and prints p50/p95 per type;
 *  3. stops the process and summarises its CPU profile: self time by package and by function.
 * npm run load is the measurement; this is the microscope:
 *   bash scripts/load-profile.sh [--seconds N] [--rate R]
 */
import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { readFlags, wholeFlag } from '../../scripts/lib/cli-flags';
import { createDataSource } from '../../server/db/data-source';
import { ApiProcess } from '../support/fault-rig';
import { freshDatabase, percentile, post } from './rig';
import { pacedHunters } from './paced-hunters';
import { summariseProfile } from './profile-summary';

const root = resolve(__dirname, '../..');
const USAGE = 'usage: bash scripts/load-profile.sh [--seconds N] [--rate R per hunter] [--port P]';
const flags = readFlags(process.argv.slice(2), { seconds: { type: 'string' }, rate: { type: 'string' }, port: { type: 'string' } }, USAGE);
const seconds = wholeFlag(flags.seconds, 15, 'seconds', USAGE);
const rate = wholeFlag(flags.rate, 6, 'rate', USAGE);
const port = wholeFlag(flags.port, 8197, 'port', USAGE);
const DB = 'strapsift_profile';
const HUNTERS = 50;
const profileDir = resolve(root, '.data/profile');
const countFile = resolve(profileDir, 'sql-counts.json');

type Counts = Record<string, { count: number; ms: number }>;

async function sqlCounts(pid: number): Promise<Counts> {
  rmSync(countFile, { force: true });
  process.kill(pid, 'SIGUSR2');
  for (let attempt = 0; attempt < 50; attempt++) {
    await sleep(50);
    try {
      return JSON.parse(readFileSync(countFile, 'utf8')) as Counts;
    } catch {
      // not written yet
    }
  }
  throw new Error('the app process wrote no SQL counts');
}

/** CPU seconds (user + system) a process has used, from /proc (Linux): the honest split between processes. */
function cpuSeconds(pid: number, part: 'user' | 'system' | 'both' = 'both'): number {
  try {
    const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
    const user = Number(fields[11]) / 100;
    const system = Number(fields[12]) / 100;
    return part === 'user' ? user : part === 'system' ? system : user + system;
  } catch {
    return 0;
  }
}

/** This database's PostgreSQL backends plus the cluster's own processes (WAL writer, checkpointer…). */
async function postgresPids(adminUrl: string): Promise<number[]> {
  const admin = createDataSource(adminUrl);
  await admin.initialize();
  const rows: Array<{ pid: number }> = await admin.query(
    `SELECT pid FROM pg_stat_activity WHERE (datname = $1 OR backend_type <> 'client backend') AND pid <> pg_backend_pid()`,
    [DB],
  );
  await admin.destroy();
  return rows.map((row) => row.pid);
}

async function main(): Promise<void> {
  rmSync(profileDir, { recursive: true, force: true });
  mkdirSync(profileDir, { recursive: true });
  const url = await freshDatabase(DB);
  const api = new ApiProcess(port, {
    DATABASE_URL: url,
    JWT_SECRET: 'profile-run-secret-0123456789-abcdefghijklmnopq',
    NODE_ENV: 'production',
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    S3_ENDPOINT: 'http://127.0.0.1:9',
    S3_ACCESS_KEY_ID: 'profile-run-key',
    S3_SECRET_ACCESS_KEY: 'profile-run-secret-key',
    TRUSTED_PROXIES: '127.0.0.1',
    NODE_OPTIONS: `--import ${resolve(__dirname, 'probe.mjs')}`,
    CPU_PROFILE_FILE: resolve(profileDir, 'app.cpuprofile'),
    SQL_COUNT_FILE: countFile,
  });
  await api.start();
  const pid = ((await (await fetch(`${api.baseUrl}/api/health`)).json()) as { pid: number }).pid;
  try {
    const sessions = await Promise.all(
      Array.from({ length: HUNTERS }, async (_, index) => {
        const email = `profile-${index}-${randomUUID().slice(0, 6)}@strapsift.test`;
        const from = `10.2.0.${index + 1}`;
        await post(`${api.baseUrl}/api/auth/register`, { email, password: 'profile-run-password', displayName: `Profile ${index}` }, undefined, from);
        const session = await post(`${api.baseUrl}/api/auth/login`, { email, password: 'profile-run-password' }, undefined, from);
        const hunt = await post(`${api.baseUrl}/api/hunts`, { title: `Profile hunt ${index}`, source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 400 }, session.token);
        return { token: session.token as string, huntId: hunt.id as string, index };
      }),
    );

    // 1. SQL per request type: 100 requests of one type, counted before and after.
    const kinds = ['batch', 'hunts', 'tally', 'straps'] as const;
    let serial = 40_000_000;
    for (const kind of kinds) {
      const before = await sqlCounts(pid);
      for (let n = 0; n < 100; n++) {
        const hunter = sessions[n % HUNTERS]!;
        const headers = { authorization: `Bearer ${hunter.token}`, 'content-type': 'application/json' };
        const response =
          kind === 'batch'
            ? await fetch(`${api.baseUrl}/api/scans/batch`, {
                method: 'POST',
                headers,
                body: JSON.stringify({
                  scans: Array.from({ length: 20 }, () => ({ id: randomUUID(), huntId: hunter.huntId, strap: 1, serial: String((serial += 1)), scannedAt: new Date().toISOString() })),
                }),
              })
            : await fetch(`${api.baseUrl}${kind === 'hunts' ? '/api/hunts' : `/api/hunts/${hunter.huntId}/${kind}`}`, { headers });
        if (!response.ok) throw new Error(`${kind}: ${response.status}`);
        await response.arrayBuffer();
      }
      const after = await sqlCounts(pid);
      console.log(`\n${kind}: SQL statements per request (count, ms waiting per request)`);
      for (const [text, entry] of Object.entries(after)) {
        const count = entry.count - (before[text]?.count ?? 0);
        if (count > 0) console.log(`  ${(count / 100).toFixed(2)} × ${((entry.ms - (before[text]?.ms ?? 0)) / 100).toFixed(2)} ms  ${text}`);
      }
    }

    // 2. The paced mix, as npm run load sends it, against this one process.
    await pacedHunters(api.baseUrl, sessions, rate, 3000);
    const pgPids = await postgresPids(process.env.PG_ADMIN_URL ?? url.replace(/\/[^/]*$/, '/postgres'));
    const pgBefore = pgPids.map((p) => cpuSeconds(p));
    const appBefore = cpuSeconds(pid);
    const appSystemBefore = cpuSeconds(pid, 'system');
    const selfBefore = process.cpuUsage();
    const wallStart = performance.now();
    const paced = await pacedHunters(api.baseUrl, sessions, rate, seconds * 1000);
    const wall = (performance.now() - wallStart) / 1000;
    const app = cpuSeconds(pid) - appBefore;
    const appSystem = cpuSeconds(pid, 'system') - appSystemBefore;
    const postgres = pgPids.reduce((sum, p, i) => sum + cpuSeconds(p) - pgBefore[i]!, 0);
    const self = process.cpuUsage(selfBefore);
    const generator = (self.user + self.system) / 1e6;
    console.log(`\npaced mix, ${HUNTERS * rate} a second offered to one process for ${seconds} s: ${paced.requests} requests, ${paced.failures} failed`);
    const perRequest = (cpu: number) => `${((cpu * 1000) / paced.requests).toFixed(2)} ms a request (${((100 * cpu) / wall).toFixed(0)}% of a core)`;
    console.log(`  CPU over ${wall.toFixed(1)} s: app ${perRequest(app)} (${((100 * appSystem) / app).toFixed(0)}% of it in the kernel), PostgreSQL ${perRequest(postgres)} over ${pgPids.length} processes, generator ${perRequest(generator)}; load average ${readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ')}`);
    for (const [kind, values] of Object.entries(paced.latencies)) {
      const sorted = [...values].sort((a, b) => a - b);
      console.log(`  ${kind.padEnd(7)} n=${sorted.length} p50 ${percentile(sorted, 50).toFixed(1)} ms  p95 ${percentile(sorted, 95).toFixed(1)} ms`);
    }
    const all = Object.values(paced.latencies).flat().sort((a, b) => a - b);
    console.log(`  all     p50 ${percentile(all, 50).toFixed(1)} ms  p95 ${percentile(all, 95).toFixed(1)} ms`);
  } finally {
    await api.stop('SIGTERM');
  }
  const file = readdirSync(profileDir).find((name) => name.endsWith('.cpuprofile'));
  if (!file) throw new Error('no CPU profile written');
  console.log(`\nCPU profile ${file}:`);
  console.log(summariseProfile(resolve(profileDir, file)));
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
