import type { DataSource } from 'typeorm';

/** A real round trip, so "up" means the database answers, not merely that it was configured. */
export async function databaseAnswers(dataSource: DataSource): Promise<boolean> {
  try {
    await dataSource.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
