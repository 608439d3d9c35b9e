import type { AuditEventQuery } from '../types';

export const auditKeys = {
  all: ['audit-events'] as const,
  lists: () => [...auditKeys.all, 'list'] as const,
  list: (query: AuditEventQuery) => [...auditKeys.lists(), query] as const,
};
