import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { config } from '../config';
import { entities } from './entities';
import { migrations } from './migrations';

export function createDataSource(url: string = config().DATABASE_URL): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    migrationsTableName: 'migrations',
    synchronize: false,
    uuidExtension: 'pgcrypto',
    installExtensions: false,
    logging: false,
    extra: { max: 20 },
  });
}

export const AppDataSource = createDataSource();
