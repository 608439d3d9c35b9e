import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { FitSelections, FitSelectionsInput } from '../types';
import { fitReportKeys } from './fit-report-keys';

/** `changes` holds only the fields to change: the server merges them into the stored selection under a row lock. */
export type UpdateFitSelectionsArgs = { projectId: string; changes: FitSelectionsInput };

export async function updateFitSelections({ projectId, changes }: UpdateFitSelectionsArgs): Promise<FitSelections> {
  const { data } = await apiClient.patch<FitSelections>(`/projects/${encodeURIComponent(projectId)}/fit-selections`, changes);
  return data;
}

export function useUpdateFitSelections({ onSuccess }: { onSuccess?: (selections: FitSelections) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateFitSelections,
    onSuccess: (selections, { projectId }) => {
      queryClient.setQueryData(fitReportKeys.selections(projectId), selections);
      onSuccess?.(selections);
    },
  });
}
