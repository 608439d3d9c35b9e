import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { MeasurementTemplate } from '../types';
import { measurementKeys } from './measurement-keys';

export async function getMeasurementTemplate(chassisId: string, signal?: AbortSignal): Promise<MeasurementTemplate> {
  const { data } = await apiClient.get<MeasurementTemplate>(`/chassis/${encodeURIComponent(chassisId)}/measurement-template`, { signal });
  return data;
}

export const measurementTemplateQueryOptions = (chassisId: string) =>
  queryOptions({ queryKey: measurementKeys.template(chassisId), queryFn: ({ signal }) => getMeasurementTemplate(chassisId, signal) });

export function useMeasurementTemplate(chassisId: string | null, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...measurementTemplateQueryOptions(chassisId ?? ''), enabled: enabled && Boolean(chassisId) });
}
