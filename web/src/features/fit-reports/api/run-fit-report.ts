import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { StoredFitReport } from '../types';
import { fitReportKeys } from './fit-report-keys';

/** Runs the fit check on the server with the project's current inputs and stores the report. A refusal is shown on the page, not as a notice. */
export async function runFitReport(projectId: string): Promise<StoredFitReport> {
  const { data } = await apiClient.post<StoredFitReport>(`/projects/${encodeURIComponent(projectId)}/fit-reports`, {}, { skipErrorNotification: true });
  return data;
}

export function useRunFitReport({ onSuccess }: { onSuccess?: (report: StoredFitReport) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: runFitReport,
    onSuccess: (report, projectId) => {
      queryClient.setQueryData(fitReportKeys.detail(report.id), report);
      void queryClient.invalidateQueries({ queryKey: fitReportKeys.list(projectId) });
      onSuccess?.(report);
    },
  });
}
