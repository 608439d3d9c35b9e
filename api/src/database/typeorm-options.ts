import { DataSourceOptions } from 'typeorm';
import { DatabaseEnvironment } from '../config/env.validation';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations';

export function buildDataSourceOptions(env: DatabaseEnvironment): DataSourceOptions {
  return {
    type: 'mysql',
    host: env.DB_HOST,
    port: env.DB_PORT,
    username: env.DB_USER,
    password: env.DB_PASSWORD,
    database: env.DB_NAME,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    migrationsTransactionMode: 'each',
    synchronize: false,
    logging: ['error', 'warn', 'migration'],
  };
}
