import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../src/config/env.validation';
import { buildDataSourceOptions } from '../src/database/typeorm-options';

export default async function globalSetup(): Promise<void> {
  if (!process.env.DB_NAME) {
    throw new Error('The API tests need the test services: run `source /work/main/.local/test/env.sh` (bash scripts/stack.sh services) first.');
  }
  if (process.env.NODE_ENV === 'production') throw new Error('Refusing to drop tables with NODE_ENV=production.');
  const dataSource = new DataSource({ ...buildDataSourceOptions(validateDatabaseEnv(process.env)), logging: ['error'] });
  await dataSource.initialize();
  try {
    await dataSource.dropDatabase();
    await dataSource.runMigrations({ transaction: 'each' });
  } finally {
    await dataSource.destroy();
  }
}
