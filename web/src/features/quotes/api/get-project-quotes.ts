import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Quote } from '../types';
import { quoteKeys } from './quote-keys';

export async function getProjectQuotes(projectId: string, signal?: AbortSignal): Promise<Quote[]> {
  const { data } = await apiClient.get<Quote[]>(`/projects/${encodeURIComponent(projectId)}/quotes`, { signal });
  return data;
}

export const projectQuotesQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: quoteKeys.project(projectId), queryFn: ({ signal }) => getProjectQuotes(projectId, signal) });

export function useProjectQuotes(projectId: string) {
  return useQuery(projectQuotesQueryOptions(projectId));
}
