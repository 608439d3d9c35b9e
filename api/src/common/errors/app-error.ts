import { HttpException } from '@nestjs/common';

/**
 * An error a person can act on: an HTTP status, a stable machine code and a readable sentence.
 * Each module lists its own in `<feature>.errors.ts`; the global filter turns them into the error body.
 */
export class AppError extends HttpException {
  constructor(
    status: number,
    public readonly code: string,
    message: string,
    public readonly details: string[] = [],
  ) {
    super({ code, message, details }, status);
  }
}

export const CommonErrors = {
  validation: (details: string[]) =>
    new AppError(400, 'validation_failed', details[0] ?? 'The request is not valid.', details),
  unauthorized: (message = 'Sign in to continue.') => new AppError(401, 'unauthorized', message),
  sessionExpired: () => new AppError(401, 'session_expired', 'Your session has expired. Sign in again.'),
  forbidden: (message = 'Your role does not allow this action in this shop.') => new AppError(403, 'forbidden', message),
  duplicate: () => new AppError(409, 'duplicate', 'A record with these values already exists.'),
  badReference: () =>
    new AppError(400, 'bad_reference', 'The request refers to a record that does not exist in your shop.'),
  stillReferenced: () =>
    new AppError(409, 'still_referenced', 'This record is still used by other records; remove those first.'),
  databaseUnavailable: () =>
    new AppError(
      503,
      'database_unavailable',
      'The database is not reachable right now, so nothing was read or saved. Try again in a moment.',
    ),
  databaseBusy: () =>
    new AppError(
      503,
      'database_busy',
      'Another change to the same records got in the way at that moment, so nothing of this one was saved. Try again.',
    ),
  internal: () =>
    new AppError(
      500,
      'internal_error',
      'Something went wrong on our side. Try again in a moment; if it keeps happening, quote the correlation id.',
    ),
};
