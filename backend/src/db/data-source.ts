import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { ENTITIES } from '../entities/index.js';
import { MIGRATIONS } from '../migrations/index.js';

export function createDataSource(url: string, options: { poolSize?: number } = {}): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    synchronize: false,
    migrationsRun: false,
    migrationsTransactionMode: 'each',
    logging: false,
    uuidExtension: 'pgcrypto',
    extra: { max: options.poolSize ?? 10 },
  });
}
