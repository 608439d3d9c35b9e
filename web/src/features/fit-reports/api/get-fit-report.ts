import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { StoredFitReport } from '../types';
import { fitReportKeys } from './fit-report-keys';

export async function getFitReport(id: string, signal?: AbortSignal): Promise<StoredFitReport> {
  const { data } = await apiClient.get<StoredFitReport>(`/fit-reports/${encodeURIComponent(id)}`, { signal });
  return data;
}

export const fitReportQueryOptions = (id: string) =>
  queryOptions({ queryKey: fitReportKeys.detail(id), queryFn: ({ signal }) => getFitReport(id, signal) });

export function useFitReport(id: string | undefined) {
  return useQuery({ ...fitReportQueryOptions(id ?? ''), enabled: Boolean(id) });
}
