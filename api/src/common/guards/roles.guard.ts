import { CanActivate, ExecutionContext, Injectable } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { CommonErrors } from '../errors/app-error';
import { IS_PUBLIC_KEY } from '../decorators/public.decorator';
import { ROLES_KEY } from '../decorators/roles.decorator';
import { Role } from '../roles/role';
import { AuthUser } from '../tenant/auth-user';

/** Global, after JwtAuthGuard: enforces `@Roles(...)` against the member's role in the current shop. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, targets)) return true;
    const roles = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, targets);
    if (!roles || roles.length === 0) return true;
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (!user) throw CommonErrors.unauthorized();
    if (!roles.includes(user.role)) {
      throw CommonErrors.forbidden(`Your role (${user.role}) does not allow this action. Ask the shop owner if you need it.`);
    }
    return true;
  }
}
