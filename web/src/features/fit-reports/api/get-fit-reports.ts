import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Page } from '@/types/api';
import type { FitReportListItem } from '../types';
import { fitReportKeys } from './fit-report-keys';

/** The project's stored reports, newest first. */
export async function getFitReports(projectId: string, signal?: AbortSignal): Promise<FitReportListItem[]> {
  const { data } = await apiClient.get<FitReportListItem[] | Page<FitReportListItem>>(
    `/projects/${encodeURIComponent(projectId)}/fit-reports`,
    { signal, params: { page: 1, pageSize: 50 } },
  );
  const items = Array.isArray(data) ? data : data.items;
  return [...items].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
}

export const fitReportsQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: fitReportKeys.list(projectId), queryFn: ({ signal }) => getFitReports(projectId, signal) });

export function useFitReports(projectId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...fitReportsQueryOptions(projectId), enabled });
}
