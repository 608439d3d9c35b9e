import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Page } from '@/types/api';
import type { CatalogItem, CatalogKind, CatalogListQuery, CatalogSpec } from '../types';
import { catalogKeys } from './catalog-keys';

export async function getCatalogItems<S = CatalogSpec>(kind: CatalogKind, query: CatalogListQuery, signal?: AbortSignal): Promise<Page<CatalogItem<S>>> {
  const params: Record<string, string | number> = { page: query.page, pageSize: query.pageSize };
  if (query.search) params.search = query.search;
  const { data } = await apiClient.get<Page<CatalogItem<S>>>(`/catalog/${kind}`, { params, signal });
  return data;
}

export const catalogItemsQueryOptions = (kind: CatalogKind, query: CatalogListQuery) =>
  queryOptions({
    queryKey: catalogKeys.list(kind, query),
    queryFn: ({ signal }) => getCatalogItems(kind, query, signal),
    placeholderData: keepPreviousData,
  });

export function useCatalogItems(kind: CatalogKind, query: CatalogListQuery, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...catalogItemsQueryOptions(kind, query), enabled });
}
