import { json } from 'express';
import { NextFunction, Request, Response } from 'express';
import { AppError } from '../errors/app-error';
import { AllExceptionsFilter } from '../filters/all-exceptions.filter';
import { correlationIdOf } from './correlation-id.middleware';

export const JSON_BODY_LIMIT = '1mb';

/**
 * Parses JSON bodies before Nest's own parser (which then skips), so a malformed or oversized body
 * gets the usual error shape instead of falling through Express's error path.
 */
export function createJsonBodyMiddleware(filter = new AllExceptionsFilter()) {
  const parse = json({ limit: JSON_BODY_LIMIT });
  return (request: Request, response: Response, next: NextFunction): void => {
    parse(request, response, (error?: unknown) => {
      if (!error) return next();
      const status = Number((error as { status?: number }).status ?? 400);
      const type = (error as { type?: string }).type;
      const message =
        type === 'entity.too.large'
          ? `The request body is larger than ${JSON_BODY_LIMIT}.`
          : type === 'entity.parse.failed'
            ? 'The request body is not valid JSON.'
            : 'The request body could not be read.';
      const code = type === 'entity.too.large' ? 'payload_too_large' : 'invalid_json';
      const body = filter.toBody(new AppError(status >= 400 && status < 500 ? status : 400, code, message), correlationIdOf(request, response));
      response.status(body.statusCode).json(body);
    });
  };
}
