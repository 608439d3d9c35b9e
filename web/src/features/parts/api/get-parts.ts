import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { QueryOf, Schemas } from '@/lib/api-types';
import { partsKeys } from './parts-keys';

export type Part = Schemas['PartResponseDto'];
export type PartPage = Schemas['PartPageResponseDto'];
export type PartListQuery = QueryOf<'/api/parts', 'get'> & { page: number; pageSize: number };

export async function getParts(query: PartListQuery, signal?: AbortSignal): Promise<PartPage> {
  const { data } = await apiClient.get<PartPage>('/parts', { params: query, signal });
  return data;
}

export const partsQueryOptions = (query: PartListQuery) =>
  queryOptions({ queryKey: partsKeys.list(query), queryFn: ({ signal }) => getParts(query, signal), placeholderData: keepPreviousData });

export function useParts(query: PartListQuery) {
  return useQuery(partsQueryOptions(query));
}
