import { QueryFailedError } from 'typeorm';
import { AppError, CommonErrors } from './app-error';

interface DriverError {
  code?: string;
  errno?: number;
}

/** Maps the MariaDB errors a request can cause to a client error; anything else stays unknown (null). */
export function mapDatabaseError(error: unknown): AppError | null {
  if (!(error instanceof QueryFailedError)) return null;
  const driverError = (error as QueryFailedError & { driverError?: DriverError }).driverError ?? {};
  switch (driverError.code) {
    case 'ER_DUP_ENTRY':
      return CommonErrors.duplicate();
    case 'ER_NO_REFERENCED_ROW':
    case 'ER_NO_REFERENCED_ROW_2':
      return CommonErrors.badReference();
    case 'ER_ROW_IS_REFERENCED':
    case 'ER_ROW_IS_REFERENCED_2':
      return CommonErrors.stillReferenced();
    case 'ER_DATA_TOO_LONG':
    case 'ER_WARN_DATA_OUT_OF_RANGE':
    case 'ER_TRUNCATED_WRONG_VALUE':
    case 'ER_CONSTRAINT_FAILED':
      return CommonErrors.validation(['A value is outside what can be stored; check lengths and ranges.']);
    default:
      return null;
  }
}
