import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { PartsPlan } from './get-project-parts-plans';
import { partsPlanKeys } from './parts-plan-keys';

export async function lockPartsPlan(planId: string): Promise<PartsPlan> {
  const { data } = await apiClient.post<PartsPlan>(`/parts-plans/${encodeURIComponent(planId)}/lock`);
  return data;
}

export function useLockPartsPlan() {
  const client = useQueryClient();
  return useSingleFlightMutation({ mutationFn: lockPartsPlan, onSuccess: () => client.invalidateQueries({ queryKey: partsPlanKeys.all }) });
}
