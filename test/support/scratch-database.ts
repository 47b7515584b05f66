import { withConnection } from '../../scripts/backup/plain-connection';
import { testDatabaseUrl } from './database';

/** A database of its own for a test that deletes accounts or drops whole databases, beside the shared one. */
export function scratchDatabaseUrl(suffix: string): string {
  const url = new URL(testDatabaseUrl());
  url.pathname = `/${url.pathname.slice(1)}_${suffix}`;
  return url.toString();
}

// The app's own role may not create databases (issue 13), so the test script hands over the superuser's URL.
function adminUrl(): string {
  if (process.env.PG_ADMIN_URL) return process.env.PG_ADMIN_URL;
  const url = new URL(testDatabaseUrl());
  url.pathname = '/postgres';
  return url.toString();
}

const nameOf = (url: string) => new URL(url).pathname.slice(1);

export async function dropDatabase(url: string): Promise<void> {
  await withConnection(adminUrl(), (query) => query(`DROP DATABASE IF EXISTS "${nameOf(url)}" WITH (FORCE)`));
}

/** Drops and creates an empty database; answers its URL. */
export async function freshDatabase(suffix: string): Promise<string> {
  const url = scratchDatabaseUrl(suffix);
  await dropDatabase(url);
  // Owned by the test's own role, which may then create the tables (the public schema follows the owner).
  const owner = decodeURIComponent(new URL(url).username);
  await withConnection(adminUrl(), (query) => query(owner ? `CREATE DATABASE "${nameOf(url)}" OWNER "${owner}"` : `CREATE DATABASE "${nameOf(url)}"`));
  return url;
}
