/** What the load run and the load profile share: a fresh database, a device's POST, percentiles. */
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

/** POSTs JSON as a hunter's device would (with a token, and a client address a trusted proxy passes on). */
export async function post(url: string, body: unknown, token?: string, from?: string) {
  const response = await fetch(url, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(token ? { Authorization: `Bearer ${token}` } : {}), ...(from ? { 'X-Forwarded-For': from } : {}) },
    body: JSON.stringify(body),
  });
  if (!response.ok) throw new Error(`${url}: ${response.status} ${await response.text()}`);
  return response.json();
}

/** The p-th percentile of sorted times (nearest rank); NaN for none. */
export function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!;
}
