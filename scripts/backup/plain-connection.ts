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
