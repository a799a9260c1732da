import { DataSource, type DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

// The one set of connection options: the app, the migrations CLI, the seed and the tests use it.
export function buildDataSourceOptions(databaseUrl: string): DataSourceOptions {
  return {
    type: 'postgres',
    url: databaseUrl,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    migrationsTransactionMode: 'each',
    uuidExtension: 'pgcrypto',
    // Schema changes go through migrations only.
    synchronize: false,
    migrationsRun: false,
    // Failed queries are not logged here: expected ones (unique violations) become 409s, the rest are logged by the filter.
    logging: ['warn', 'migration'],
  };
}

// The instance the TypeORM CLI loads (`typeorm -d dist/database/data-source.js ...`).
export const AppDataSource = new DataSource(buildDataSourceOptions(process.env.DATABASE_URL ?? ''));
