import type { PagedQueryOf, ResponseOf, Schemas } from '@/lib/api-types';

export type AuditEvent = Schemas['AuditEventResponseDto'];
export type AuditEventPage = ResponseOf<'/api/audit-events', 'get'>;
export type AuditEventQuery = PagedQueryOf<'/api/audit-events'>;
export type AuditKind = AuditEvent['kind'];
