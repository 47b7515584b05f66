/**
 * Archive bench (issue 16). Run through `npm run bench` (PostgreSQL up, a local object store on S3_PORT).
 *
 * 1. For an account of 5,000 and of 50,000 notes, each with 100 keepers and 200 photos, times the full
 *    archive export (GET /api/export/archive, saved to disk as it streams) and its restore into the
 *    account created again after deletion (POST /api/import/archive, the file streamed from disk), and
 *    samples the process's memory every 5 ms: the peak above the level before each step. Both must
 *    stream, so the peak may not grow with the number of notes.
 * 2. Times `npm run backup` and `npm run restore` of the demo database (seeded as `npm start` does).
 *
 * Figures go to docs/PERFORMANCE.md under "## Archive" (pass --no-write to only print).
 */
import { execFile } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { createWriteStream, openAsBlob } from 'node:fs';
import { mkdtemp, readdir, rm, stat } from 'node:fs/promises';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import { join, resolve } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { promisify } from 'node:util';
import sharp from 'sharp';
import { DataSource } from 'typeorm';
import { writeDocSection } from '../../support/doc-section';

process.env.LOG_LEVEL = 'silent';
process.env.NODE_ENV ??= 'test';

const run = promisify(execFile);
const root = resolve(__dirname, '../../..');
const write = !process.argv.includes('--no-write');
const port = Number(process.env.PGPORT ?? 54329);
const DB = 'strapsift_archive_bench';
const adminUrl = `postgres://postgres@127.0.0.1:${port}/postgres`;
const benchUrl = `postgres://postgres@127.0.0.1:${port}/${DB}`;
const SIZES = [5_000, 50_000];
const KEEPERS = 100;
const MB = 1024 * 1024;

async function recreate(name: string, drop = false): Promise<void> {
  const admin = new DataSource({ type: 'postgres', url: adminUrl });
  await admin.initialize();
  try {
    await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    if (!drop) await admin.query(`CREATE DATABASE ${name}`);
  } finally {
    await admin.destroy();
  }
}

/**
 * Peak memory while `work` runs, above what the process held just before: RSS sampled every 5 ms, and the
 * live JS heap (plus buffers) measured right after a forced collection every 500 ms, which leaves out
 * garbage not yet collected. The forced collections cost a little time, included in the times below.
 */
async function measured<T>(work: () => Promise<T>): Promise<{ value: T; seconds: number; rss: number; heap: number }> {
  const gc = (globalThis as { gc?: () => void }).gc ?? (() => undefined);
  gc();
  const base = process.memoryUsage();
  const live = () => {
    const now = process.memoryUsage();
    return now.heapUsed + now.arrayBuffers;
  };
  let rss = base.rss;
  let heap = live();
  const baseHeap = heap;
  const sampler = setInterval(() => (rss = Math.max(rss, process.memoryUsage().rss)), 5);
  const collector = setInterval(() => {
    gc();
    heap = Math.max(heap, live());
  }, 500);
  const started = performance.now();
  try {
    const value = await work();
    return { value, seconds: (performance.now() - started) / 1000, rss: rss - base.rss, heap: heap - baseHeap };
  } finally {
    clearInterval(sampler);
    clearInterval(collector);
  }
}

let state = 0xa5c1;
const nextSerial = () => {
  state = (Math.imul(state, 1103515245) + 12345) >>> 0;
  return String(1 + (state % 99_999_998)).padStart(8, '0');
};

/** What the two sizes say about memory against the number of notes, worded from the figures themselves. */
function flatness(rows: Array<{ notes: number; step: string; rss: number }>): string {
  const [small, large] = SIZES;
  const words = ['export', 'restore'].map((step) => {
    const at = (notes: number) => rows.find((r) => r.notes === notes && r.step.startsWith(step))!.rss / MB;
    const ratio = at(large!) / Math.max(1, at(small!));
    return `${step} ${at(small!).toFixed(0)} MB → ${at(large!).toFixed(0)} MB (×${ratio.toFixed(1)})`;
  });
  return `Peak RSS from ${small!.toLocaleString('en-US')} to ${large!.toLocaleString('en-US')} notes (×${large! / small!}): ${words.join(', ')}; time grows roughly with the notes, memory does not.`;
}

async function main(): Promise<void> {
  const loadStart = os.loadavg();
  await recreate(DB);
  const { createDataSource } = await import('../../../server/db/data-source');
  const dataSource = createDataSource(benchUrl);
  await dataSource.initialize();
  await dataSource.runMigrations();
  const { createApp } = await import('../../../server/app');
  const server = createApp({ dataSource }).listen(0, '127.0.0.1');
  await new Promise<void>((done) => server.once('listening', done));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api`;
  const folder = await mkdtemp(join(os.tmpdir(), 'archive-bench-'));

  const call = async (path: string, init: RequestInit & { token?: string } = {}) => {
    const headers = new Headers(init.headers);
    if (init.token) headers.set('Authorization', `Bearer ${init.token}`);
    if (typeof init.body === 'string') headers.set('Content-Type', 'application/json');
    const response = await fetch(`${base}${path}`, { ...init, headers });
    if (!response.ok) throw new Error(`${init.method ?? 'GET'} ${path}: ${response.status} ${await response.text()}`);
    return response;
  };
  const json = async <T>(path: string, init: RequestInit & { token?: string } = {}) => (await (await call(path, init)).json()) as T;
  const register = async (email: string) =>
    (await json<{ token: string }>('/auth/register', { method: 'POST', body: JSON.stringify({ email, password: 'bench-archive-2026', displayName: 'Bench hunter' }) })).token;

  // Invented photos: a noisy card of 1,200 × 600, about what a phone photo of a note weighs once stored.
  const photos = await Promise.all(
    Array.from({ length: 2 * KEEPERS }, (_, i) =>
      sharp({ create: { width: 1200, height: 600, channels: 3, background: { r: 240 - (i % 50), g: 236, b: 226 }, noise: { type: 'gaussian', mean: 128, sigma: 18 } } })
        .jpeg({ quality: 82 })
        .toBuffer(),
    ),
  );

  const rows: Array<{ notes: number; step: string; seconds: number; rss: number; heap: number; size: string }> = [];
  for (const notes of SIZES) {
    const email = `bench-${notes}-${randomUUID().slice(0, 6)}@strapsift.test`;
    let token = await register(email);
    let clock = Date.parse('2026-06-01T15:00:00.000Z');
    const scanIds: string[] = [];
    for (let h = 0; h < notes / 10_000 || h === 0; h++) {
      const hunt = await json<{ id: string }>('/hunts', { method: 'POST', token, body: JSON.stringify({ title: `Box ${h + 1}`, source: 'Larkspur Valley Credit Union', denomination: 1, plannedStraps: 100 }) });
      const inHunt = Math.min(10_000, notes - h * 10_000);
      for (let from = 0; from < inHunt; from += 1000) {
        const batch = Array.from({ length: Math.min(1000, inHunt - from) }, (_, i) => {
          clock += 3000;
          return { id: randomUUID(), huntId: hunt.id, strap: 1 + Math.floor((from + i) / 100), serial: nextSerial(), scannedAt: new Date(clock).toISOString() };
        });
        if (scanIds.length < KEEPERS) scanIds.push(...batch.slice(0, KEEPERS - scanIds.length).map((scan) => scan.id));
        await call('/scans/batch', { method: 'POST', token, body: JSON.stringify({ scans: batch }) });
      }
    }
    for (let k = 0; k < KEEPERS; k++) {
      const keeper = await json<{ id: string }>('/keepers', { method: 'POST', token, body: JSON.stringify({ scanId: scanIds[k] }) });
      for (const [s, side] of (['front', 'back'] as const).entries()) {
        const form = new FormData();
        form.append('side', side);
        form.append('photo', new Blob([photos[2 * k + s]!], { type: 'image/jpeg' }), `${side}.jpg`);
        await call(`/keepers/${keeper.id}/photos`, { method: 'POST', token, body: form });
      }
    }

    const file = join(folder, `archive-${notes}.zip`);
    const exported = await measured(
      () =>
        new Promise<void>((done, fail) => {
          http.get(`${base}/export/archive`, { headers: { Authorization: `Bearer ${token}` } }, (res) => {
            if (res.statusCode !== 200) return fail(new Error(`export answered ${res.statusCode}`));
            pipeline(res, createWriteStream(file)).then(done, fail);
          });
        }),
    );
    const size = (await stat(file)).size;
    rows.push({ notes, step: 'export (GET /api/export/archive)', seconds: exported.seconds, rss: exported.rss, heap: exported.heap, size: `${(size / MB).toFixed(1)} MB zip` });

    await call('/me', { method: 'DELETE', token });
    token = await register(email);
    const restored = await measured(async () => {
      const form = new FormData();
      form.append('archive', await openAsBlob(file, { type: 'application/zip' }), 'archive.zip');
      return json<{ counts: { notes: { add: number }; photos: { add: number } } }>('/import/archive', { method: 'POST', token, body: form });
    });
    if (restored.value.counts.notes.add !== notes || restored.value.counts.photos.add !== 2 * KEEPERS) {
      throw new Error(`restore added ${restored.value.counts.notes.add} notes and ${restored.value.counts.photos.add} photos`);
    }
    rows.push({ notes, step: 'restore (POST /api/import/archive)', seconds: restored.seconds, rss: restored.rss, heap: restored.heap, size: `${notes.toLocaleString('en-US')} notes, ${2 * KEEPERS} photos added` });
    process.stdout.write(`${notes} notes: export ${exported.seconds.toFixed(1)} s, restore ${restored.seconds.toFixed(1)} s\n`);
  }
  server.close();
  await dataSource.destroy();
  await recreate(DB, true);

  // The demo database through the operator's own commands.
  const drill = 'strapsift_backup_bench';
  await recreate(drill);
  const backups = join(folder, 'backups');
  const env = { ...process.env, DATABASE_URL: `postgres://postgres@127.0.0.1:${port}/${drill}`, S3_BUCKET: 'strapsift-backup-bench', BACKUP_DIR: backups, LOG_LEVEL: 'silent' };
  const { bucketOf } = await import('../../../scripts/backup/bucket');
  const { loadConfig } = await import('../../../server/config');
  const bucket = bucketOf(loadConfig(env));
  await bucket.ensure();
  await run('node', ['--import', 'tsx', 'node_modules/typeorm/cli.js', 'migration:run', '-d', 'server/db/data-source.ts'], { env, cwd: root });
  await run(join(root, 'node_modules/.bin/tsx'), ['server/db/seed/run-seed.ts'], { env, cwd: root });
  const timed = async (args: string[]) => {
    const started = performance.now();
    const { stdout } = await run('bash', args, { env, cwd: root, maxBuffer: 8 * MB });
    return { seconds: (performance.now() - started) / 1000, stdout };
  };
  const backup = await timed(['scripts/backup.sh']);
  const [made] = await readdir(backups);
  await recreate(drill, true);
  await bucket.drop();
  const restore = await timed(['scripts/restore.sh', join(backups, made!)]);
  const backupLines = backup.stdout.split('\n').filter((line) => /database\.dump|objects\//.test(line)).map((line) => line.trim());
  await recreate(drill, true);
  await bucket.drop().catch(() => undefined);
  await rm(folder, { recursive: true, force: true });

  const loadEnd = os.loadavg();
  const cpu = os.cpus();
  const machine = `${cpu.length} × ${cpu[0]?.model.split(' ').slice(0, 2).join(' ')}, ${Math.round(os.totalmem() / 1024 ** 3)} GB, Node ${process.version}; load ${loadStart.map((l) => l.toFixed(2)).join(' / ')} at start, ${loadEnd.map((l) => l.toFixed(2)).join(' / ')} at end`;
  const table = [
    '| notes | step | time | peak RSS above start | peak live JS heap + buffers above start | size |',
    '| --- | --- | --- | --- | --- | --- |',
    ...rows.map((r) => `| ${r.notes.toLocaleString('en-US')} | ${r.step} | ${r.seconds.toFixed(1)} s | ${(r.rss / MB).toFixed(0)} MB | ${(r.heap / MB).toFixed(0)} MB | ${r.size} |`),
  ].join('\n');
  process.stdout.write(`\n${table}\nbackup ${backup.seconds.toFixed(1)} s, restore ${restore.seconds.toFixed(1)} s\n`);
  if (write) {
    const section = [
      '## Archive',
      '',
      `Measured ${new Date().toISOString().slice(0, 10)} by \`npm run bench\` (test/bench/archive/archive-bench.ts) on ${machine}.`,
      `Each account has ${KEEPERS} keepers with ${2 * KEEPERS} photos (invented 1,200 × 600 JPEGs) and its notes in hunts of 10,000. The export`,
      'is read over HTTP and written to disk as it arrives; the restore uploads that file, streamed from disk, into the same account',
      'created again after deletion. App, client and sampler share one process, so the memory figures include the client side too.',
      'RSS above start is 0 MB where the process already held that much from setting up the accounts (drawing and uploading photos); the live heap after a forced collection is the figure for what a step keeps.',
      '',
      table,
      '',
      'Both directions stream: the export reads 2,000 rows a page and hands each page to the compressor (a worker thread) before',
      'reading the next, waiting whenever the socket or the compressor is behind; the restore spools the upload to a temporary file',
      'and reads it three times (check, records, photos), one record of strapsift.json at a time, writing 1,000 notes per transaction.',
      flatness(rows),
      '',
      '| demo database | time |',
      '| --- | --- |',
      `| \`npm run backup\` (pg_dump custom format + bucket copy + manifest of checksums) | ${backup.seconds.toFixed(1)} s |`,
      `| \`npm run restore\` into a dropped database and bucket, then every table and object checked | ${restore.seconds.toFixed(1)} s |`,
      '',
      ...backupLines.map((line) => `- ${line}`),
      '',
    ].join('\n');
    writeDocSection(join(root, 'docs/PERFORMANCE.md'), section, 'Performance');
    process.stdout.write('Wrote the Archive section of docs/PERFORMANCE.md\n');
  }
}

// Exit outright: a failure part-way leaves the app's server listening, which would keep the process alive.
main().then(
  () => process.exit(0),
  (error: unknown) => {
    console.error('archive bench failed:', error);
    process.exit(1);
  },
);
