import { ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { CommonErrors } from '../errors/app-error';
import { isDatabaseUnreachable } from '../errors/database-error.mapper';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';

/** Global: every route needs a valid access token unless marked `@Public()`. */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  canActivate(context: ExecutionContext) {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    return super.canActivate(context);
  }

  handleRequest<TUser>(error: unknown, user: TUser, info: unknown): TUser {
    // A database that cannot be reached while the session is checked is our outage (503), not a bad token (401).
    if (error && isDatabaseUnreachable(error)) throw CommonErrors.databaseUnavailable();
    if (error) throw error instanceof Error && 'getStatus' in error ? error : CommonErrors.unauthorized();
    if (!user) {
      if (info instanceof Error && info.name === 'TokenExpiredError') throw CommonErrors.sessionExpired();
      if (info instanceof Error && info.message === 'No auth token') {
        throw CommonErrors.unauthorized('Sign in to continue: this request needs an access token.');
      }
      throw CommonErrors.unauthorized('Your access token is not valid. Sign in again.');
    }
    return user;
  }
}
