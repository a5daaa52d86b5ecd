import type { DataSourceOptions } from 'typeorm';
import type { DatabaseConfig } from '../config/app-config';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

/** The one description of the database connection, used by the app, the migration runner, the seed and tests. */
export function buildDataSourceOptions(database: DatabaseConfig): DataSourceOptions {
  return {
    type: 'mariadb',
    host: database.host,
    port: database.port,
    database: database.name,
    username: database.user,
    password: database.password,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    // The schema changes only through committed migrations.
    synchronize: false,
    migrationsRun: false,
    timezone: 'Z',
    charset: 'utf8mb4_unicode_ci',
    connectTimeout: 5000,
  };
}
