import { QueryFailedError } from 'typeorm';
import { AppError, CommonErrors } from './app-error';

interface DriverError {
  code?: string;
  errno?: number;
}

/**
 * Driver errors that mean the database server cannot be reached (stopped, restarting, network gone, out of
 * connections): the request is answered 503 and the pool reconnects by itself once the server is back.
 */
const UNREACHABLE_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENOTFOUND',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_CON_COUNT_ERROR',
  'ER_CONNECTION_KILLED',
  'ER_QUERY_INTERRUPTED',
]);

/** True when `error` (a TypeORM QueryFailedError or a raw driver/pool error) says the database is unreachable. */
export function isDatabaseUnreachable(error: unknown): boolean {
  if (!error || typeof error !== 'object') return false;
  const candidates = [error, (error as { driverError?: unknown }).driverError, (error as { cause?: unknown }).cause];
  return candidates.some((candidate) => {
    if (!candidate || typeof candidate !== 'object') return false;
    const { code, fatal, message } = candidate as { code?: unknown; fatal?: unknown; message?: unknown };
    if (typeof code === 'string' && UNREACHABLE_CODES.has(code)) return true;
    if (fatal === true && typeof code === 'string') return true;
    return typeof message === 'string' && /Pool is closed|connect ECONNREFUSED|Connection lost/.test(message);
  });
}

/** Maps the MariaDB errors a request can cause to a client error (or a 503 when unreachable); anything else stays unknown (null). */
export function mapDatabaseError(error: unknown): AppError | null {
  if (isDatabaseUnreachable(error)) return CommonErrors.databaseUnavailable();
  if (!(error instanceof QueryFailedError)) return null;
  const driverError = (error as QueryFailedError & { driverError?: DriverError }).driverError ?? {};
  switch (driverError.code) {
    // The transaction was rolled back whole by the server; the same request can simply be sent again.
    case 'ER_LOCK_DEADLOCK':
    case 'ER_LOCK_WAIT_TIMEOUT':
      return CommonErrors.databaseBusy();
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
