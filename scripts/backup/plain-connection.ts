import { DataSource } from 'typeorm';

/** A bare connection (no entities, no migrations) for tools that only run SQL. */
export async function withConnection<T>(url: string, work: (query: (sql: string, params?: unknown[]) => Promise<Array<Record<string, unknown>>>) => Promise<T>): Promise<T> {
  const connection = new DataSource({ type: 'postgres', url, logging: false, extra: { max: 1 } });
  await connection.initialize();
  try {
    return await work((sql, params) => connection.query(sql, params));
  } finally {
    await connection.destroy();
  }
}

/**
 * A read-only snapshot held open while `work` runs: pg_dump --snapshot=<id> then sees exactly the data the
 * checksums were computed on, even with the app writing meanwhile.
 */
export async function withSnapshot<T>(url: string, work: (snapshot: string, query: (sql: string) => Promise<Array<Record<string, unknown>>>) => Promise<T>): Promise<T> {
  const connection = new DataSource({ type: 'postgres', url, logging: false, extra: { max: 1 } });
  await connection.initialize();
  const runner = connection.createQueryRunner();
  try {
    await runner.connect();
    await runner.query('BEGIN ISOLATION LEVEL REPEATABLE READ READ ONLY');
    const [row] = (await runner.query('SELECT pg_export_snapshot() AS id')) as Array<{ id: string }>;
    const result = await work(row!.id, (sql) => runner.query(sql));
    await runner.query('COMMIT');
    return result;
  } finally {
    await runner.release();
    await connection.destroy();
  }
}
