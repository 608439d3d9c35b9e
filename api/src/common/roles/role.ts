export { ROLES, type Role } from '@swapwright/shared';
