import { Role } from '../roles/role';

/** The signed-in member, resolved from the access token on every request (see auth/jwt.strategy.ts). */
export interface AuthUser {
  userId: string;
  email: string;
  name: string;
  membershipId: string;
  shopId: string;
  role: Role;
  /** The customer record linked to this login (role customer), else null. */
  customerId: string | null;
}
