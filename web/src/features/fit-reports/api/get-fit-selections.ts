import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { FitSelections } from '../types';
import { fitReportKeys } from './fit-report-keys';

export async function getFitSelections(projectId: string, signal?: AbortSignal): Promise<FitSelections> {
  const { data } = await apiClient.get<FitSelections>(`/projects/${encodeURIComponent(projectId)}/fit-selections`, { signal });
  return data;
}

export const fitSelectionsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: fitReportKeys.selections(projectId), queryFn: ({ signal }) => getFitSelections(projectId, signal) });

export function useFitSelections(projectId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...fitSelectionsQueryOptions(projectId), enabled });
}
