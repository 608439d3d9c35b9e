import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { MeasurementSheet } from '../types';
import { measurementKeys } from './measurement-keys';

/** Marks the sheet complete (every required point measured); later changes need a reason. */
export async function signOffMeasurementSheet(projectId: string): Promise<MeasurementSheet> {
  const { data } = await apiClient.post<MeasurementSheet>(`/projects/${encodeURIComponent(projectId)}/measurement-sheet/sign-off`, {});
  return data;
}

export function useSignOffMeasurementSheet(projectId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: () => signOffMeasurementSheet(projectId),
    onSuccess: (sheet) => client.setQueryData(measurementKeys.sheet(projectId), sheet),
  });
}
