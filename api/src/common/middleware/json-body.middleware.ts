import { json } from 'express';
import { NextFunction, Request, Response } from 'express';
import { AppError } from '../errors/app-error';
import { AllExceptionsFilter } from '../filters/all-exceptions.filter';
import { correlationIdOf } from './correlation-id.middleware';
import { jsonDepthExceeds, MAX_JSON_DEPTH } from './json-depth';

export const JSON_BODY_LIMIT = '1mb';

const TOO_DEEP = 'entity.too.deep';

/** Runs on the raw bytes before JSON.parse: a body nested deeper than MAX_JSON_DEPTH is refused unparsed. */
function refuseDeepNesting(request: Request, _response: Response, buffer: Buffer): void {
  // Signed webhooks are verified over the exact bytes received, so those keep them.
  if (request.originalUrl?.startsWith('/api/payments/webhook')) (request as Request & { rawBody?: Buffer }).rawBody = buffer;
  if (jsonDepthExceeds(buffer, MAX_JSON_DEPTH)) throw Object.assign(new Error('too deep'), { status: 400, type: TOO_DEEP });
}

/**
 * Parses JSON bodies before Nest's own parser (which then skips), so a malformed, oversized or too deeply
 * nested body gets the usual error shape instead of falling through Express's error path.
 */
export function createJsonBodyMiddleware(filter = new AllExceptionsFilter()) {
  const parse = json({ limit: JSON_BODY_LIMIT, verify: refuseDeepNesting });
  return (request: Request, response: Response, next: NextFunction): void => {
    parse(request, response, (error?: unknown) => {
      if (!error) return next();
      const status = Number((error as { status?: number }).status ?? 400);
      const type = (error as { type?: string }).type;
      const message =
        type === 'entity.too.large'
          ? `The request body is larger than ${JSON_BODY_LIMIT}.`
          : type === TOO_DEEP
            ? `The request body is nested more than ${MAX_JSON_DEPTH} levels deep; no Swapwright request needs that many.`
            : type === 'entity.parse.failed'
              ? 'The request body is not valid JSON.'
              : 'The request body could not be read.';
      const code = type === 'entity.too.large' ? 'payload_too_large' : type === TOO_DEEP ? 'body_too_deep' : 'invalid_json';
      const refusedStatus = type === TOO_DEEP ? 400 : status >= 400 && status < 500 ? status : 400;
      const body = filter.toBody(new AppError(refusedStatus, code, message), correlationIdOf(request, response));
      response.status(body.statusCode).json(body);
    });
  };
}
