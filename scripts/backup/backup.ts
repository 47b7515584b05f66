// npm run backup: the database with pg_dump (custom format) and a copy of the photo bucket, into
// .data/backups/<timestamp>/, keeping the newest BACKUP_KEEP folders. Prints what it wrote.
import { createHash } from 'node:crypto';
import { createReadStream } from 'node:fs';
import { mkdir, readdir, rm, stat, writeFile } from 'node:fs/promises';
import { dirname, join, resolve } from 'node:path';
import { loadConfig } from '../../server/config';
import { bucketOf, safeKey } from './bucket';
import { checksumsWith } from './checksums';
import { DUMP, MANIFEST, OBJECTS, type BackupManifest } from './manifest';
import { withSnapshot } from './plain-connection';
import { runTool } from './pg-tools';

const sha256File = (path: string) =>
  new Promise<string>((done, fail) => {
    const hash = createHash('sha256');
    createReadStream(path).on('data', (chunk) => hash.update(chunk)).on('end', () => done(hash.digest('hex'))).on('error', fail);
  });

async function main(): Promise<void> {
  const settings = loadConfig();
  const root = resolve(process.env.BACKUP_DIR ?? '.data/backups');
  const keep = Math.max(1, Number(process.env.BACKUP_KEEP ?? 7));
  const started = Date.now();
  const createdAt = new Date();
  const folder = join(root, createdAt.toISOString().replace(/[-:]/g, ''));
  await mkdir(join(folder, OBJECTS), { recursive: true });

  // One snapshot for both the checksums and the dump, so a backup taken while the app is writing still
  // matches its own manifest. Photo objects are copied after: one uploaded meanwhile is an extra object
  // nothing points at; one deleted meanwhile is missing (docs/OPERATIONS.md says how to avoid both).
  const dump = join(folder, DUMP);
  const tables = await withSnapshot(settings.DATABASE_URL, async (snapshot, query) => {
    const summary = await checksumsWith(query);
    await runTool('pg_dump', ['--format=custom', '--no-owner', '--no-privileges', `--snapshot=${snapshot}`, `--file=${dump}`, `--dbname=${settings.DATABASE_URL}`]);
    return summary;
  });

  const bucket = bucketOf(settings);
  const objects: BackupManifest['bucket']['objects'] = [];
  for (const key of await bucket.store.list('')) {
    const object = await bucket.store.get(safeKey(key));
    if (!object) continue;
    const path = join(folder, OBJECTS, key);
    await mkdir(dirname(path), { recursive: true });
    await writeFile(path, object.body);
    objects.push({ key, bytes: object.body.length, sha256: createHash('sha256').update(object.body).digest('hex'), contentType: object.contentType ?? 'application/octet-stream' });
  }

  const manifest: BackupManifest = {
    format: 'strapsift-backup',
    version: 1,
    createdAt: createdAt.toISOString(),
    database: { file: DUMP, bytes: (await stat(dump)).size, sha256: await sha256File(dump), tables },
    bucket: { name: settings.S3_BUCKET, objects },
  };
  await writeFile(join(folder, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);

  // Oldest first by name (the names are UTC timestamps); only finished backups count toward the N kept.
  const finished: string[] = [];
  for (const name of (await readdir(root)).sort()) {
    if ((await stat(join(root, name, MANIFEST)).catch(() => null))?.isFile()) finished.push(name);
  }
  const removed = finished.slice(0, Math.max(0, finished.length - keep));
  for (const name of removed) await rm(join(root, name), { recursive: true, force: true });

  const rows = Object.values(tables).reduce((sum, table) => sum + table.rows, 0);
  const objectBytes = objects.reduce((sum, object) => sum + object.bytes, 0);
  console.log(`backup written to ${folder}`);
  console.log(`  ${DUMP}: ${manifest.database.bytes} bytes (pg_dump custom format), ${Object.keys(tables).length} tables, ${rows} rows`);
  console.log(`  ${OBJECTS}/: ${objects.length} objects, ${objectBytes} bytes from bucket ${settings.S3_BUCKET}`);
  console.log(`  ${MANIFEST}: row counts and checksums of every table, SHA-256 of every object`);
  console.log(`  kept the newest ${keep}${removed.length ? `; removed ${removed.join(', ')}` : ''}`);
  console.log(`  took ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

main().catch((error: unknown) => {
  console.error(`backup failed: ${(error as Error).message}`);
  process.exit(1);
});
