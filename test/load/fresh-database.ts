import { createDataSource } from '../../server/db/data-source';

/** The superuser's URL for the local cluster: the rigs create and drop databases of their own. */
export const adminDatabaseUrl = (): string => process.env.PG_ADMIN_URL ?? `postgres://postgres@127.0.0.1:${process.env.PGPORT ?? 54329}/postgres`;

/** Drops and re-creates `name`, runs every migration on it, and answers its URL. */
export async function freshDatabase(name: string): Promise<string> {
  const adminUrl = adminDatabaseUrl();
  const admin = createDataSource(adminUrl);
  await admin.initialize();
  await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.destroy();
  const url = adminUrl.replace(/\/[^/]*$/, `/${name}`);
  const migrator = createDataSource(url);
  await migrator.initialize();
  await migrator.runMigrations();
  await migrator.destroy();
  return url;
}
