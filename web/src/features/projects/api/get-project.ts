import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Project } from '../types';
import { projectKeys } from './project-keys';

export async function getProject(id: string, signal?: AbortSignal): Promise<Project> {
  const { data } = await apiClient.get<Project>(`/projects/${encodeURIComponent(id)}`, {
    signal,
    // the page shows its own not-found and error states
    skipErrorNotification: true,
  });
  return data;
}

export const projectQueryOptions = (id: string) =>
  queryOptions({ queryKey: projectKeys.detail(id), queryFn: ({ signal }) => getProject(id, signal) });

export function useProject(id: string) {
  return useQuery(projectQueryOptions(id));
}
