import { applyDecorators, Injectable, UseGuards } from '@nestjs/common';
import { ApiTooManyRequestsResponse } from '@nestjs/swagger';
import { ThrottlerGuard, ThrottlerLimitDetail } from '@nestjs/throttler';
import { ExecutionContext } from '@nestjs/common';
import { AppError } from '../errors/app-error';
import { ErrorResponseDto } from '../errors/error-response.dto';

/**
 * Counts attempts per client address and route (limit and window from AUTH_RATE_LIMIT and
 * AUTH_RATE_WINDOW_SECONDS); past the limit it answers 429 with `Retry-After` in seconds.
 */
@Injectable()
export class AuthRateLimitGuard extends ThrottlerGuard {
  protected async throwThrottlingException(_context: ExecutionContext, detail: ThrottlerLimitDetail): Promise<void> {
    const seconds = Math.max(1, Math.ceil(detail.timeToBlockExpire));
    throw new AppError(
      429,
      'too_many_attempts',
      `Too many attempts from this address. Wait ${seconds} second${seconds === 1 ? '' : 's'} and try again.`,
    );
  }
}

/** Sign-in, sign-up and password reset: limited per address against guessing and mail flooding. */
export function AuthRateLimited() {
  return applyDecorators(
    UseGuards(AuthRateLimitGuard),
    ApiTooManyRequestsResponse({ type: ErrorResponseDto, description: 'Too many attempts; the Retry-After header gives the seconds to wait' }),
  );
}
