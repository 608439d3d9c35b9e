import { useMutation } from '@tanstack/react-query';
import type { FitSpec } from '@swapwright/shared';
import { apiClient } from '@/lib/api-client';
import type { FitReport } from '../types';

/** Runs the fit check on the server for any spec without storing it. */
export async function whatIfFit(spec: FitSpec): Promise<FitReport> {
  const { data } = await apiClient.post<FitReport>('/fit-reports/what-if', spec);
  return data;
}

export function useWhatIfFit() {
  return useMutation({ mutationFn: whatIfFit });
}
