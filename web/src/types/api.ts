/** Shapes from the HTTP API contract that more than one feature needs. */

import type { Role, UnitSystem } from '@swapwright/shared';

export { ROLES as roles, UNIT_SYSTEMS as unitSystems, type Role, type UnitSystem } from '@swapwright/shared';

export type CurrentUser = {
  id: string;
  email: string;
  name: string;
  role: Role;
  shop: { id: string; name: string; unitSystem: UnitSystem };
  customerId: string | null;
};

export type Session = {
  accessToken: string;
  refreshToken: string;
  expiresIn: number;
  user: CurrentUser;
};

export type Page<T> = {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
};

export type SortOrder = 'asc' | 'desc';

export type ApiErrorBody = {
  statusCode: number;
  error: string;
  code: string;
  message: string;
  details?: string[];
  correlationId?: string;
};
