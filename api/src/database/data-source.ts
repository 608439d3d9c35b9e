import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { validateDatabaseEnv } from '../config/env.validation';
import { buildDataSourceOptions } from './typeorm-options';

/** For the TypeORM CLI (`npm run migration:run -w api`) and the seed script. */
export const appDataSource = new DataSource(buildDataSourceOptions(validateDatabaseEnv(process.env)));
