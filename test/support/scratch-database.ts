import { withConnection } from '../../scripts/backup/plain-connection';
import { testDatabaseUrl } from './database';

/** A database of its own for a test that deletes accounts or drops whole databases, beside the shared one. */
export function scratchDatabaseUrl(suffix: string): string {
  const url = new URL(testDatabaseUrl());
  url.pathname = `/${url.pathname.slice(1)}_${suffix}`;
  return url.toString();
}

function adminUrl(): string {
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
  await withConnection(adminUrl(), (query) => query(`CREATE DATABASE "${nameOf(url)}"`));
  return url;
}
