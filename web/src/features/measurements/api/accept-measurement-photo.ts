import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { MeasurementPhoto } from '../types';
import { measurementKeys } from './measurement-keys';

/** Accepts a photo a customer added. */
export async function acceptMeasurementPhoto(photoId: string): Promise<MeasurementPhoto> {
  const { data } = await apiClient.post<MeasurementPhoto>(`/measurement-photos/${encodeURIComponent(photoId)}/accept`, {});
  return data;
}

export function useAcceptMeasurementPhoto(projectId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: acceptMeasurementPhoto,
    onSuccess: () => client.invalidateQueries({ queryKey: measurementKeys.sheet(projectId) }),
  });
}
