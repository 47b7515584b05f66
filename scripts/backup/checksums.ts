import { withConnection } from './plain-connection';

export interface TableSummary {
  rows: number;
  /** MD5 over the MD5 of every row's text, sorted: equal for equal contents whatever the physical order. */
  checksum: string;
}

type Query = (sql: string, params?: unknown[]) => Promise<Array<Record<string, unknown>>>;

/** Row count and content checksum of every table in the public schema, the migrations table included. */
export async function tableChecksums(databaseUrl: string): Promise<Record<string, TableSummary>> {
  return withConnection(databaseUrl, checksumsWith);
}

/** The same, through a given connection (a backup's snapshot transaction). */
export async function checksumsWith(query: Query): Promise<Record<string, TableSummary>> {
  const tables = await query(
    `SELECT table_name AS name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY table_name`,
  );
  const summary: Record<string, TableSummary> = {};
  for (const { name } of tables as Array<{ name: string }>) {
    const quoted = `"${name.replace(/"/g, '""')}"`;
    const [row] = await query(
      `SELECT count(*) AS rows, md5(COALESCE(string_agg(h, '' ORDER BY h), '')) AS checksum FROM (SELECT md5(t::text) AS h FROM ${quoted} t) x`,
    );
    summary[name] = { rows: Number(row?.rows), checksum: String(row?.checksum ?? '') };
  }
  return summary;
}
