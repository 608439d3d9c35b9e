import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CatalogItem, CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

export async function getCatalogItem(kind: CatalogKind, id: string, signal?: AbortSignal): Promise<CatalogItem> {
  const { data } = await apiClient.get<CatalogItem>(`/catalog/${kind}/${encodeURIComponent(id)}`, { signal });
  return data;
}

export const catalogItemQueryOptions = (kind: CatalogKind, id: string) =>
  queryOptions({ queryKey: catalogKeys.detail(kind, id), queryFn: ({ signal }) => getCatalogItem(kind, id, signal) });

export function useCatalogItem(kind: CatalogKind, id: string | null | undefined) {
  return useQuery({ ...catalogItemQueryOptions(kind, id ?? ''), enabled: Boolean(id) });
}
