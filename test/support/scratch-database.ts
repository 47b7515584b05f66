import { Client } from 'pg';
import { testDatabaseUrl } from './database';

/** A database of its own for a test that deletes accounts or drops whole databases, beside the shared one. */
export function scratchDatabaseUrl(suffix: string): string {
  const url = new URL(testDatabaseUrl());
  url.pathname = `/${url.pathname.slice(1)}_${suffix}`;
  return url.toString();
}

async function admin<T>(run: (client: Client) => Promise<T>): Promise<T> {
  const url = new URL(testDatabaseUrl());
  url.pathname = '/postgres';
  const client = new Client({ connectionString: url.toString() });
  await client.connect();
  try {
    return await run(client);
  } finally {
    await client.end();
  }
}

const nameOf = (url: string) => new URL(url).pathname.slice(1);

export async function dropDatabase(url: string): Promise<void> {
  await admin((client) => client.query(`DROP DATABASE IF EXISTS "${nameOf(url)}" WITH (FORCE)`));
}

/** Drops and creates an empty database; answers its URL. */
export async function freshDatabase(suffix: string): Promise<string> {
  const url = scratchDatabaseUrl(suffix);
  await dropDatabase(url);
  await admin((client) => client.query(`CREATE DATABASE "${nameOf(url)}"`));
  return url;
}
