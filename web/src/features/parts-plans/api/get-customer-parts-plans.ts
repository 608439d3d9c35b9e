import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Schemas } from '@/lib/api-types';
import { partsPlanKeys } from './parts-plan-keys';

/** A plan as the project's customer reads it: parts at the plan's prices, operations, totals; nothing shop-only. */
export type CustomerPartsPlan = Schemas['CustomerPartsPlanResponseDto'];

/** GET /projects/:projectId/parts-plans as the customer: the customer's view of each version, newest first. */
export async function getCustomerPartsPlans(projectId: string, signal?: AbortSignal): Promise<CustomerPartsPlan[]> {
  const { data } = await apiClient.get<CustomerPartsPlan[]>(`/projects/${encodeURIComponent(projectId)}/parts-plans`, { signal });
  return data;
}

export const customerPartsPlansQueryOptions = (projectId: string) =>
  queryOptions({ queryKey: partsPlanKeys.customerView(projectId), queryFn: ({ signal }) => getCustomerPartsPlans(projectId, signal) });

export function useCustomerPartsPlans(projectId: string) {
  return useQuery(customerPartsPlansQueryOptions(projectId));
}
