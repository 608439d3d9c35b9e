import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { FitReportComparison } from '../types';
import { fitReportKeys } from './fit-report-keys';

export async function compareFitReports(a: string, b: string, signal?: AbortSignal): Promise<FitReportComparison> {
  const { data } = await apiClient.get<FitReportComparison>('/fit-reports/compare', { params: { a, b }, signal });
  return data;
}

export const fitReportComparisonQueryOptions = (a: string, b: string) =>
  queryOptions({ queryKey: fitReportKeys.compare(a, b), queryFn: ({ signal }) => compareFitReports(a, b, signal) });

export function useFitReportComparison(a: string | undefined, b: string | undefined) {
  return useQuery({ ...fitReportComparisonQueryOptions(a ?? '', b ?? ''), enabled: Boolean(a && b && a !== b) });
}
