import { AppError } from '../common/errors/app-error';

export const HealthErrors = {
  databaseDown: () => new AppError(503, 'database_down', 'The database does not answer. Check that MariaDB is running.'),
};
