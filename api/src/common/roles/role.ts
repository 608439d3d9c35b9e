export type Role = 'owner' | 'estimator' | 'fabricator' | 'counter' | 'customer';
export const ROLES: Role[] = ['owner', 'estimator', 'fabricator', 'counter', 'customer'];
