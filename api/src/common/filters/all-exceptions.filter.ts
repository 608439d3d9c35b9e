import { ArgumentsHost, Catch, ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import { STATUS_CODES } from 'node:http';
import { Request, Response } from 'express';
import { AppError, CommonErrors } from '../errors/app-error';
import { mapDatabaseError } from '../errors/database-error.mapper';
import { correlationIdOf } from '../middleware/correlation-id.middleware';

export interface ErrorBody {
  statusCode: number;
  error: string;
  code: string;
  message: string;
  details: string[];
  correlationId: string;
}

const DEFAULT_CODES: Record<number, string> = {
  400: 'bad_request',
  401: 'unauthorized',
  403: 'forbidden',
  404: 'not_found',
  405: 'method_not_allowed',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  422: 'unprocessable',
  429: 'too_many_requests',
  503: 'service_unavailable',
};

function messagesOf(response: unknown): string[] {
  if (typeof response === 'string') return [response];
  if (response && typeof response === 'object' && 'message' in response) {
    const message = (response as { message: unknown }).message;
    if (Array.isArray(message)) return message.map(String);
    if (typeof message === 'string') return [message];
  }
  return [];
}

/** The one place that shapes error bodies; unknown errors are logged and answered with a generic 500. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request>();
    const response = http.getResponse<Response>();
    const correlationId = correlationIdOf(request, response);
    const body = this.toBody(exception, correlationId, request);
    if (response.headersSent) return;
    if (body.statusCode === 503) response.setHeader('Retry-After', '5');
    response.status(body.statusCode).json(body);
  }

  toBody(exception: unknown, correlationId: string, request?: Request): ErrorBody {
    const known = this.toKnownError(exception);
    if (!known) {
      this.logger.error(
        `[${correlationId}] ${request?.method ?? ''} ${request?.originalUrl ?? ''}: ${
          exception instanceof Error ? (exception.stack ?? exception.message) : String(exception)
        }`,
      );
      return this.shape(CommonErrors.internal(), correlationId);
    }
    if (known.getStatus() >= 500) {
      this.logger.warn(`[${correlationId}] ${known.getStatus()} ${known.code}: ${known.message}`);
    }
    return this.shape(known, correlationId);
  }

  private toKnownError(exception: unknown): AppError | null {
    if (exception instanceof AppError) return exception;
    const fromDatabase = mapDatabaseError(exception);
    if (fromDatabase) return fromDatabase;
    if (exception instanceof HttpException) {
      const status = exception.getStatus();
      if (status >= 500) return null;
      const messages = messagesOf(exception.getResponse());
      const message = messages[0] ?? STATUS_CODES[status] ?? 'Request refused.';
      return new AppError(status, DEFAULT_CODES[status] ?? 'error', message, messages);
    }
    // body-parser rejects malformed JSON with a plain error carrying a 4xx status.
    if (exception && typeof exception === 'object' && 'status' in exception && 'type' in exception) {
      const status = Number((exception as { status: unknown }).status);
      if (status >= 400 && status < 500) {
        const message =
          (exception as { type: unknown }).type === 'entity.parse.failed'
            ? 'The request body is not valid JSON.'
            : (STATUS_CODES[status] ?? 'Request refused.');
        return new AppError(status, DEFAULT_CODES[status] ?? 'bad_request', message, [message]);
      }
    }
    return null;
  }

  private shape(error: AppError, correlationId: string): ErrorBody {
    const status = error.getStatus();
    return {
      statusCode: status,
      error: STATUS_CODES[status] ?? 'Error',
      code: error.code,
      message: error.message,
      details: error.details.length > 0 ? error.details : [error.message],
      correlationId,
    };
  }
}
