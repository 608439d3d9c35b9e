import { isAxiosError } from 'axios';
import type { Schemas } from '@/lib/api-types';

/** The API's error answer (every 4xx/5xx the API itself sends). */
export type ApiErrorBody = Schemas['ErrorResponseDto'];

export function getApiErrorBody(error: unknown): ApiErrorBody | null {
  if (!isAxiosError(error)) return null;
  const data = error.response?.data as Partial<ApiErrorBody> | undefined;
  if (data && typeof data === 'object' && typeof data.message === 'string') {
    return {
      statusCode: data.statusCode ?? error.response?.status ?? 0,
      error: data.error ?? '',
      code: data.code ?? 'unknown',
      message: data.message,
      details: data.details ?? [],
      correlationId: data.correlationId ?? '',
    };
  }
  return null;
}

export function getStatus(error: unknown): number | null {
  return isAxiosError(error) ? (error.response?.status ?? null) : null;
}

/** Whether sending the same file again can help: not when the server refused the file's kind (415). */
export function retryCanHelp(error: unknown): boolean {
  return getStatus(error) !== 415;
}

/** A sentence a person can act on, for any error thrown by a request. */
export function getErrorMessage(error: unknown): string {
  const body = getApiErrorBody(error);
  if (body) return body.message;
  if (isAxiosError(error)) {
    if (!error.response) return 'The Swapwright server could not be reached. Check your connection and try again.';
    return `The server answered ${error.response.status}. Try again in a moment.`;
  }
  if (error instanceof Error) return error.message;
  return 'Something went wrong. Try again.';
}
