import type { Role } from '@swapwright/shared';
import type { RequestBodyOf, Schemas } from '@/lib/api-types';

export type Membership = Schemas['MembershipResponseDto'];
export type Invitation = Schemas['InvitationResponseDto'];
export type CreateInvitationInput = RequestBodyOf<'/api/invitations', 'post'>;
export type MembershipChanges = RequestBodyOf<'/api/memberships/{id}', 'patch'>;

export const roleLabels: Record<Role, string> = {
  owner: 'Owner',
  estimator: 'Estimator',
  fabricator: 'Fabricator',
  counter: 'Parts counter',
  customer: 'Customer',
};

export const roleHints: Record<Role, string> = {
  owner: 'Everything, including members and rates',
  estimator: 'Projects, customers, fit checks, parts plans and quotes',
  fabricator: 'Measurement sheets, photos, fit checks and work orders',
  counter: 'Catalog, stock, reservations and pick lists',
  customer: 'Follows their own projects, approves and pays quotes',
};
