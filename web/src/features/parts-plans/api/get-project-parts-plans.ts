import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Schemas } from '@/lib/api-types';
import { partsPlanKeys } from './parts-plan-keys';

export type PartsPlan = Schemas['PartsPlanResponseDto'];

export async function getProjectPartsPlans(projectId: string, signal?: AbortSignal): Promise<PartsPlan[]> {
  const { data } = await apiClient.get<PartsPlan[]>(`/projects/${encodeURIComponent(projectId)}/parts-plans`, { signal });
  return data;
}

export const projectPartsPlansQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: partsPlanKeys.project(projectId), queryFn: ({ signal }) => getProjectPartsPlans(projectId, signal) });

export function useProjectPartsPlans(projectId: string) {
  return useQuery(projectPartsPlansQueryOptions(projectId));
}
