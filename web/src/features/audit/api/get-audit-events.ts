import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { AuditEventPage, AuditEventQuery } from '../types';
import { auditKeys } from './audit-keys';

export async function getAuditEvents(query: AuditEventQuery, signal?: AbortSignal): Promise<AuditEventPage> {
  const { data } = await apiClient.get<AuditEventPage>('/audit-events', { params: query, signal });
  return data;
}

export const auditEventsQueryOptions = (query: AuditEventQuery) =>
  queryOptions({
    queryKey: auditKeys.list(query),
    queryFn: ({ signal }) => getAuditEvents(query, signal),
    placeholderData: keepPreviousData,
  });

export function useAuditEvents(query: AuditEventQuery, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...auditEventsQueryOptions(query), enabled });
}
