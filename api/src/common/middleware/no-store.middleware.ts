import { NextFunction, Request, Response } from 'express';

/**
 * API answers carry per-user data: keep them out of shared caches. A route that may be cached (a photo) sets its own
 * header later. An Express middleware rather than a Nest interceptor: with no global interceptor, Nest calls each
 * handler directly instead of through an RxJS pipeline on every request.
 */
export function noStoreMiddleware(_request: Request, response: Response, next: NextFunction): void {
  response.setHeader('Cache-Control', 'no-store');
  next();
}
