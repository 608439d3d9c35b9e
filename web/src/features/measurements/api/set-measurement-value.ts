import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { getApiErrorBody } from '@/lib/api-error';
import type { MeasurementSheet, SetMeasurementValueBody } from '../types';
import { measurementKeys } from './measurement-keys';

export type SetMeasurementValueInput = { pointId: string; body: SetMeasurementValueBody };

/** The API's answer when someone else saved the point's reading after the person started typing theirs. */
export const READING_CHANGED = 'measurement_reading_changed';

export function isReadingChanged(error: unknown): boolean {
  return getApiErrorBody(error)?.code === READING_CHANGED;
}

/**
 * Records a reading (the old one goes to the history); answers the whole sheet. The body's `seenVersion` names the
 * reading it replaces: when someone saved another one since, the API answers 409 and nothing changes.
 */
export async function setMeasurementValue(projectId: string, { pointId, body }: SetMeasurementValueInput): Promise<MeasurementSheet> {
  const { data } = await apiClient.put<MeasurementSheet>(
    `/projects/${encodeURIComponent(projectId)}/measurement-sheet/values/${encodeURIComponent(pointId)}`,
    body,
    { skipErrorNotification: true },
  );
  return data;
}

export function useSetMeasurementValue(projectId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (input: SetMeasurementValueInput) => setMeasurementValue(projectId, input),
    onSuccess: (sheet) => client.setQueryData(measurementKeys.sheet(projectId), sheet),
    // their reading is fetched at once, so the person sees both before choosing
    onError: (error) => {
      if (isReadingChanged(error)) void client.invalidateQueries({ queryKey: measurementKeys.sheet(projectId) });
    },
  });
}
