export const memberKeys = {
  all: ['members'] as const,
  memberships: () => [...memberKeys.all, 'memberships'] as const,
  invitations: () => [...memberKeys.all, 'invitations'] as const,
};
