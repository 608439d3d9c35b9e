import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import type { PartsPlan } from './get-project-parts-plans';
import { partsPlanKeys } from './parts-plan-keys';

export type BuildPartsPlanBody = RequestBodyOf<'/api/projects/{projectId}/parts-plans', 'post'>;

export async function buildPartsPlan(projectId: string, body: BuildPartsPlanBody): Promise<PartsPlan> {
  const { data } = await apiClient.post<PartsPlan>(`/projects/${encodeURIComponent(projectId)}/parts-plans`, body);
  return data;
}

export function useBuildPartsPlan(projectId: string) {
  const client = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: (body: BuildPartsPlanBody) => buildPartsPlan(projectId, body),
    onSuccess: () => client.invalidateQueries({ queryKey: partsPlanKeys.all }),
  });
}
