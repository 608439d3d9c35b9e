import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { measurementKeys } from './measurement-keys';

export async function deleteMeasurementPhoto(photoId: string): Promise<void> {
  await apiClient.delete(`/measurement-photos/${encodeURIComponent(photoId)}`);
}

export function useDeleteMeasurementPhoto(projectId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: deleteMeasurementPhoto,
    onSuccess: () => client.invalidateQueries({ queryKey: measurementKeys.sheet(projectId) }),
  });
}
