import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Schemas } from '@/lib/api-types';
import { counterKeys } from './counter-keys';

export type PlanSummary = Schemas['PlanSummaryResponseDto'];

export async function getRecentPartsPlans(signal?: AbortSignal): Promise<PlanSummary[]> {
  const { data } = await apiClient.get<PlanSummary[]>('/parts-plans', { signal });
  return data;
}

export const recentPartsPlansQueryOptions = () => queryOptions({ queryKey: counterKeys.plans(), queryFn: ({ signal }) => getRecentPartsPlans(signal) });

export function useRecentPartsPlans() {
  return useQuery(recentPartsPlansQueryOptions());
}
