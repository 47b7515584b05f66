import 'reflect-metadata';
import type { DataSource } from 'typeorm';
import { createDataSource } from '../../server/db/data-source';

/** The database the test script created and migrated for server tests (fresh each run). */
export function testDatabaseUrl(): string {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error('TEST_DATABASE_URL is not set; run the tests with `npm test`');
  return url;
}

export async function openTestDataSource(url = testDatabaseUrl()): Promise<DataSource> {
  const dataSource = createDataSource(url);
  await dataSource.initialize();
  return dataSource;
}
