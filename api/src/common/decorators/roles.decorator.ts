import { SetMetadata } from '@nestjs/common';
import { Role } from '../roles/role';

export const ROLES_KEY = 'swapwright:roles';

/** Only members with one of these roles in the current shop may call the route (see role-matrix.ts). */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
