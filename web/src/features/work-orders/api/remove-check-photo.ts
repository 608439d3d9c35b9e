import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { WorkOrder } from '../types';
import { workOrderKeys } from './work-order-keys';

/** Removes a check photo and its file (a wrong one, while the job is in the bay; a finished work order keeps its photos). */
export async function removeCheckPhoto(photoId: string): Promise<void> {
  await apiClient.delete(`/work-order-photos/${encodeURIComponent(photoId)}`);
}

const withoutPhoto = (order: WorkOrder, photoId: string): WorkOrder => ({
  ...order,
  steps: order.steps.map((step) => ({
    ...step,
    checks: step.checks.map((check) => ({ ...check, photos: check.photos.filter((photo) => photo.id !== photoId) })),
  })),
});

export function useRemoveCheckPhoto(workOrderId: string) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: removeCheckPhoto,
    onSuccess: (_, photoId) => {
      // the photo leaves the check at once; the work order is read again to be sure
      queryClient.setQueryData<WorkOrder>(workOrderKeys.detail(workOrderId), (order) => order && withoutPhoto(order, photoId));
      queryClient.removeQueries({ queryKey: workOrderKeys.photoFile(photoId) });
      void queryClient.invalidateQueries({ queryKey: workOrderKeys.detail(workOrderId) });
    },
  });
}
