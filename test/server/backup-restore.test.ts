import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtemp, readdir } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bucketOf } from '../../scripts/backup/bucket';
import { tableChecksums } from '../../scripts/backup/checksums';
import { loadConfig } from '../../server/config';
import { openTestDataSource } from '../support/database';
import { dropDatabase, freshDatabase } from '../support/scratch-database';

const run = promisify(execFile);

let url: string;
let env: NodeJS.ProcessEnv;
let bucket: ReturnType<typeof bucketOf>;
let backups: string;

/** The npm scripts themselves, as an operator runs them, against this test's own database and bucket. */
const script = (name: 'backup' | 'restore', args: string[] = []) => run('bash', [`scripts/${name}.sh`, ...args], { env, maxBuffer: 8 * 1024 * 1024 });

async function objectHashes(): Promise<Record<string, string>> {
  const hashes: Record<string, string> = {};
  for (const key of await bucket.store.list('')) hashes[key] = createHash('sha256').update((await bucket.store.get(key))!.body).digest('hex');
  return hashes;
}

beforeAll(async () => {
  url = await freshDatabase('backup_drill');
  const migrate = await openTestDataSource(url);
  await migrate.runMigrations();
  await migrate.destroy();
  const name = `${(process.env.TEST_DB_PREFIX ?? 'strapsift').toLowerCase().replace(/[^a-z0-9-]/g, '-')}-backup-drill`;
  backups = await mkdtemp(join(tmpdir(), 'strapsift-backups-'));
  env = { ...process.env, DATABASE_URL: url, S3_BUCKET: name, BACKUP_DIR: backups, BACKUP_KEEP: '2', LOG_LEVEL: 'silent' };
  bucket = bucketOf(loadConfig(env));
  await bucket.ensure();
  await bucket.store.delete(await bucket.store.list(''));
  // The demo data, photos included, as `npm start` seeds it.
  await run('node_modules/.bin/tsx', ['server/db/seed/run-seed.ts'], { env });
}, 120_000);
afterAll(async () => {
  await bucket?.drop().catch(() => undefined);
  if (url) await dropDatabase(url);
});

describe('npm run backup / npm run restore', () => {
  it('when the database and the bucket are lost, then a restore brings back every row and every object, checked', async () => {
    const tables = await tableChecksums(url);
    const objects = await objectHashes();
    expect(tables.scans!.rows).toBeGreaterThan(1000);
    expect(Object.keys(objects).length).toBeGreaterThan(0);

    const first = await script('backup');
    expect(first.stdout).toMatch(/backup written to .*\n\s+database\.dump: \d+ bytes \(pg_dump custom format\), \d+ tables/);
    await script('backup');
    const third = await script('backup');
    // BACKUP_KEEP=2: the oldest of the three is gone.
    const kept = (await readdir(backups)).sort();
    expect(kept).toHaveLength(2);
    expect(third.stdout).toMatch(/removed \d{8}T/);
    const newest = join(backups, kept[1]!);

    await dropDatabase(url);
    await bucket.drop();

    const restored = await script('restore', [newest]);
    expect(restored.stdout).toMatch(/every row count and checksum matches/);
    // Checked again here, independently of the script's own check.
    expect(await tableChecksums(url)).toEqual(tables);
    expect(await objectHashes()).toEqual(objects);
  }, 180_000);

  it('when the database already holds data, then restore refuses unless --force is given', async () => {
    const newest = join(backups, (await readdir(backups)).sort().at(-1)!);
    await expect(script('restore', [newest])).rejects.toMatchObject({ stderr: expect.stringMatching(/is not empty .* pass --force/) });
    const forced = await script('restore', [newest, '--force']);
    expect(forced.stdout).toMatch(/every SHA-256 matches/);
  }, 120_000);
});
