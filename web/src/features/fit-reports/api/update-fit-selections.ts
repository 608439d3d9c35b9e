import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { FitSelections, FitSelectionsInput } from '../types';
import { fitReportKeys } from './fit-report-keys';

export type UpdateFitSelectionsArgs = { projectId: string; selections: FitSelectionsInput };

export async function updateFitSelections({ projectId, selections }: UpdateFitSelectionsArgs): Promise<FitSelections> {
  const { data } = await apiClient.put<FitSelections>(`/projects/${encodeURIComponent(projectId)}/fit-selections`, selections);
  return data;
}

export function useUpdateFitSelections({ onSuccess }: { onSuccess?: (selections: FitSelections) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateFitSelections,
    onSuccess: (selections, { projectId }) => {
      queryClient.setQueryData(fitReportKeys.selections(projectId), selections);
      onSuccess?.(selections);
    },
  });
}
