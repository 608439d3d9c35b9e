import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { MeasurementSheet } from '../types';
import { measurementKeys } from './measurement-keys';

export async function getMeasurementSheet(projectId: string, signal?: AbortSignal): Promise<MeasurementSheet> {
  const { data } = await apiClient.get<MeasurementSheet>(`/projects/${encodeURIComponent(projectId)}/measurement-sheet`, { signal });
  return data;
}

export const measurementSheetQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: measurementKeys.sheet(projectId), queryFn: ({ signal }) => getMeasurementSheet(projectId, signal) });

export function useMeasurementSheet(projectId: string) {
  return useQuery(measurementSheetQueryOptions(projectId));
}
