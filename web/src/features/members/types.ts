import type { Role } from '@/types/api';

export type Membership = { id: string; userId: string; email: string; name: string; role: Role; createdAt: string };

export type Invitation = { id: string; email: string; role: Role; expiresAt: string; acceptedAt: string | null };

export type CreateInvitationInput = { email: string; role: Role; customerId?: string };

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
