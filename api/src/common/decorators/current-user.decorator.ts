import { createParamDecorator, ExecutionContext } from '@nestjs/common';
import { CommonErrors } from '../errors/app-error';
import { AuthUser } from '../tenant/auth-user';

export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): AuthUser => {
  const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
  if (!user) throw CommonErrors.unauthorized();
  return user;
});
