import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { MeasurementSheet, SetMeasurementValueBody } from '../types';
import { measurementKeys } from './measurement-keys';

export type SetMeasurementValueInput = { pointId: string; body: SetMeasurementValueBody };

/** Records a reading (the old one goes to the history); answers the whole sheet. */
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
  return useMutation({
    mutationFn: (input: SetMeasurementValueInput) => setMeasurementValue(projectId, input),
    onSuccess: (sheet) => client.setQueryData(measurementKeys.sheet(projectId), sheet),
  });
}
