import { DataSource } from 'typeorm';
import { loadDatabaseConfig, type DatabaseConfig } from '../config/app-config';
import { buildDataSourceOptions } from './data-source-options';

/** A DataSource for command-line jobs (migrations, seed), configured from the environment's DB_* variables. */
export function createCliDataSource(database: DatabaseConfig = loadDatabaseConfig()): DataSource {
  return new DataSource(buildDataSourceOptions(database));
}
