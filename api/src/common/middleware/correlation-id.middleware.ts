import { randomUUID } from 'node:crypto';
import { NextFunction, Request, Response } from 'express';

export const CORRELATION_HEADER = 'x-correlation-id';
const SAFE_ID = /^[A-Za-z0-9._-]{8,64}$/;

type WithCorrelation = Request & { correlationId?: string };

/** Takes a well-formed incoming X-Correlation-Id or makes one; echoes it on the response. */
export function correlationIdMiddleware(request: Request, response: Response, next: NextFunction): void {
  correlationIdOf(request, response);
  next();
}

export function correlationIdOf(request: Request, response?: Response): string {
  const withId = request as WithCorrelation;
  if (!withId.correlationId) {
    const incoming = request.headers?.[CORRELATION_HEADER];
    withId.correlationId = typeof incoming === 'string' && SAFE_ID.test(incoming) ? incoming : randomUUID();
  }
  if (response && !response.headersSent) response.setHeader('X-Correlation-Id', withId.correlationId);
  return withId.correlationId;
}
