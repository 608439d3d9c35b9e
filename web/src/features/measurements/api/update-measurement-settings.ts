import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { MeasurementSettings, MeasurementSettingsBody } from '../types';
import { measurementKeys } from './measurement-keys';

/** Sets the shop's limits (owner); every sheet and the next fit report flag readings against them. */
export async function updateMeasurementSettings(body: MeasurementSettingsBody): Promise<MeasurementSettings> {
  const { data } = await apiClient.put<MeasurementSettings>('/measurement-settings', body, { skipErrorNotification: true });
  return data;
}

export function useUpdateMeasurementSettings({ onSuccess }: { onSuccess?: (settings: MeasurementSettings) => void } = {}) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateMeasurementSettings,
    onSuccess: (settings) => {
      client.setQueryData(measurementKeys.settings(), settings);
      // the sheets' "far from catalog" flags follow the new limits
      void client.invalidateQueries({ queryKey: measurementKeys.sheets() });
      onSuccess?.(settings);
    },
  });
}
