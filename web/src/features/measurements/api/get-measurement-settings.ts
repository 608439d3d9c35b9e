import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { MeasurementSettings } from '../types';
import { measurementKeys } from './measurement-keys';

/** How far from the catalog a reading may be before it is flagged for a second look (staff read it). */
export async function getMeasurementSettings(signal?: AbortSignal): Promise<MeasurementSettings> {
  const { data } = await apiClient.get<MeasurementSettings>('/measurement-settings', { signal });
  return data;
}

export const measurementSettingsQueryOptions = () =>
  queryOptions({ queryKey: measurementKeys.settings(), queryFn: ({ signal }) => getMeasurementSettings(signal) });

export function useMeasurementSettings({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...measurementSettingsQueryOptions(), enabled });
}
