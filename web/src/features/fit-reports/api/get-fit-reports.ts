import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { ResponseOf } from '@/lib/api-types';
import { fitReportKeys } from './fit-report-keys';

export type FitReportPage = ResponseOf<'/api/projects/{id}/fit-reports', 'get'>;

/** The project's stored reports, newest first (the API's order). */
export async function getFitReports(projectId: string, signal?: AbortSignal): Promise<FitReportPage> {
  const { data } = await apiClient.get<FitReportPage>(`/projects/${encodeURIComponent(projectId)}/fit-reports`, {
    signal,
    params: { page: 1, pageSize: 50 },
  });
  return data;
}

export const fitReportsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: fitReportKeys.list(projectId), queryFn: ({ signal }) => getFitReports(projectId, signal) });

export function useFitReports(projectId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...fitReportsQueryOptions(projectId), enabled });
}
