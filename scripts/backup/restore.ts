// npm run restore -- DIR [--force]: a backup folder into a fresh database and bucket, then a check that
// every table's row count and checksum and every object's SHA-256 match what the backup recorded.
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { loadConfig } from '../../server/config';
import { bucketOf, safeKey } from './bucket';
import { tableChecksums } from './checksums';
import { MANIFEST, OBJECTS, type BackupManifest } from './manifest';
import { withConnection } from './plain-connection';
import { runTool } from './pg-tools';

/**
 * The maintenance database beside the target: databases are created and dropped from there, as the
 * superuser (PG_ADMIN_URL) when given, because the app's own role may not create databases.
 */
function adminUrl(databaseUrl: string): { url: string; name: string; owner: string } {
  const url = new URL(databaseUrl);
  const name = decodeURIComponent(url.pathname.slice(1));
  const owner = decodeURIComponent(url.username);
  if (process.env.PG_ADMIN_URL) return { url: process.env.PG_ADMIN_URL, name, owner };
  url.pathname = '/postgres';
  return { url: url.toString(), name, owner };
}

const quote = (name: string) => `"${name.replace(/"/g, '""')}"`;

/** Makes sure the target database exists and is empty; a database with tables is only replaced with --force. */
async function freshDatabase(databaseUrl: string, force: boolean): Promise<string> {
  const { url, name, owner } = adminUrl(databaseUrl);
  return withConnection(url, async (admin) => {
    const exists = (await admin(`SELECT 1 FROM pg_database WHERE datname = $1`, [name])).length === 1;
    if (exists) {
      const [row] = await withConnection(databaseUrl, (target) => target(`SELECT count(*)::int AS n FROM information_schema.tables WHERE table_schema = 'public'`));
      const tables = Number(row?.n);
      if (tables > 0 && !force) {
        throw new Error(`database ${name} is not empty (${tables} tables); restore into a fresh database, or pass --force to replace it`);
      }
      if (tables === 0) return name;
      await admin(`DROP DATABASE ${quote(name)} WITH (FORCE)`);
    }
    // Owned by the role that restores into it and then runs the app, so it may create the tables.
    await admin(owner ? `CREATE DATABASE ${quote(name)} OWNER ${quote(owner)}` : `CREATE DATABASE ${quote(name)}`);
    return name;
  });
}

async function main(): Promise<void> {
  const args = process.argv.slice(2);
  const force = args.includes('--force');
  const dir = args.find((arg) => !arg.startsWith('--'));
  if (!dir) throw new Error('usage: npm run restore -- <backup folder> [--force]');
  const folder = resolve(dir);
  const manifest = JSON.parse(await readFile(join(folder, MANIFEST), 'utf8')) as BackupManifest;
  if (manifest.format !== 'strapsift-backup' || manifest.version !== 1) throw new Error(`${folder} is not a version 1 Strapsift backup`);
  const settings = loadConfig();
  const started = Date.now();

  const dump = join(folder, manifest.database.file);
  const dumpHash = createHash('sha256').update(await readFile(dump)).digest('hex');
  if (dumpHash !== manifest.database.sha256) throw new Error(`${dump} does not match its SHA-256 in the manifest; the backup is damaged`);

  const bucket = bucketOf(settings);
  await bucket.ensure();
  const existing = await bucket.store.list('');
  if (existing.length && !force) throw new Error(`bucket ${settings.S3_BUCKET} is not empty (${existing.length} objects); pass --force to replace its contents`);

  const name = await freshDatabase(settings.DATABASE_URL, force);
  await runTool('pg_restore', ['--no-owner', '--no-privileges', '--exit-on-error', `--dbname=${settings.DATABASE_URL}`, dump]);

  if (existing.length) await bucket.store.delete(existing);
  for (const object of manifest.bucket.objects) {
    const body = await readFile(join(folder, OBJECTS, safeKey(object.key)));
    if (createHash('sha256').update(body).digest('hex') !== object.sha256) throw new Error(`object ${object.key} in the backup does not match its SHA-256`);
    await bucket.store.put(object.key, body, object.contentType);
  }

  // The proof: the restored database and bucket hold what the backup recorded, row for row, byte for byte.
  const tables = await tableChecksums(settings.DATABASE_URL);
  const wrong = Object.keys({ ...tables, ...manifest.database.tables }).filter(
    (table) => JSON.stringify(tables[table]) !== JSON.stringify(manifest.database.tables[table]),
  );
  if (wrong.length) throw new Error(`restored tables differ from the backup: ${wrong.join(', ')}`);
  const restored = await bucket.store.list('');
  if (restored.length !== manifest.bucket.objects.length) throw new Error(`bucket holds ${restored.length} objects, the backup ${manifest.bucket.objects.length}`);
  for (const object of manifest.bucket.objects) {
    const back = await bucket.store.get(object.key);
    if (!back || createHash('sha256').update(back.body).digest('hex') !== object.sha256) throw new Error(`object ${object.key} differs after restore`);
  }

  const rows = Object.values(tables).reduce((sum, table) => sum + table.rows, 0);
  console.log(`restored ${folder} (made ${manifest.createdAt})`);
  console.log(`  database ${name}: ${Object.keys(tables).length} tables, ${rows} rows; every row count and checksum matches`);
  console.log(`  bucket ${settings.S3_BUCKET}: ${restored.length} objects; every SHA-256 matches`);
  console.log(`  took ${((Date.now() - started) / 1000).toFixed(1)} s`);
}

main().catch((error: unknown) => {
  console.error(`restore failed: ${(error as Error).message}`);
  process.exit(1);
});
