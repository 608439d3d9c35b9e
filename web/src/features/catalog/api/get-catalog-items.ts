import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CatalogKind, CatalogListQuery, CatalogPageOf } from '../types';
import { catalogKeys } from './catalog-keys';

export async function getCatalogItems<K extends CatalogKind>(kind: K, query: CatalogListQuery, signal?: AbortSignal): Promise<CatalogPageOf<K>> {
  const params: CatalogListQuery = { page: query.page, pageSize: query.pageSize };
  if (query.search) params.search = query.search;
  const { data } = await apiClient.get<CatalogPageOf<K>>(`/catalog/${kind}`, { params, signal });
  return data;
}

export const catalogItemsQueryOptions = <K extends CatalogKind>(kind: K, query: CatalogListQuery) =>
  queryOptions({
    queryKey: catalogKeys.list(kind, query),
    queryFn: ({ signal }) => getCatalogItems(kind, query, signal),
    placeholderData: keepPreviousData,
  });

export function useCatalogItems<K extends CatalogKind>(kind: K, query: CatalogListQuery, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...catalogItemsQueryOptions(kind, query), enabled });
}
