import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { migrations } from '../../server/db/migrations';
import { seedDemo } from '../../server/db/seed/demo-seed';
import { openTestDataSource } from '../support/database';

const run = promisify(execFile);

function migrationsDatabaseUrl(): string {
  const url = process.env.MIGRATIONS_DATABASE_URL;
  if (!url) throw new Error('MIGRATIONS_DATABASE_URL is not set; run the tests with `npm test`');
  return url;
}

async function userTables(dataSource: DataSource): Promise<string[]> {
  const rows: { table_name: string }[] = await dataSource.query(
    "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'migrations' ORDER BY table_name",
  );
  return rows.map((row) => row.table_name);
}

describe('database migrations', () => {
  let dataSource: DataSource;
  beforeAll(async () => {
    dataSource = await openTestDataSource(migrationsDatabaseUrl());
  });
  afterAll(async () => {
    await dataSource.destroy();
  });

  it('when run on an empty database, then every migration applies and creates the tables', async () => {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    expect(applied).toHaveLength(migrations.length);
    expect(await userTables(dataSource)).toContain('users');
  });

  it('when the entities are compared with the migrated schema, then the TypeORM CLI finds no drift', async () => {
    const cli = run(
      process.execPath,
      ['--import', 'tsx', 'node_modules/typeorm/cli.js', 'migration:generate', 'test-results/drift-check', '--check', '-d', 'server/db/data-source.ts'],
      { env: { ...process.env, DATABASE_URL: migrationsDatabaseUrl() } },
    );
    // --check exits 1 and prints the missing SQL when entities and migrations disagree.
    await expect(cli).resolves.toMatchObject({ stdout: expect.stringContaining('No changes in database schema were found') });
  }, 60_000);

  it('when the demo data is in and every migration is reverted, then the database is empty again', async () => {
    await seedDemo(dataSource);
    const [{ count }] = await dataSource.query('SELECT count(*)::int AS count FROM scans');
    expect(count).toBeGreaterThan(1000);
    for (let index = 0; index < migrations.length; index++) await dataSource.undoLastMigration({ transaction: 'each' });
    expect(await userTables(dataSource)).toEqual([]);
  });

  it('when the migrations run again after a full revert, then the schema and the demo come back', async () => {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    expect(applied).toHaveLength(migrations.length);
    const { created } = await seedDemo(dataSource);
    expect(created.length).toBeGreaterThan(0);
  });
});
