import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CatalogItemOf, CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

export async function getCatalogItem<K extends CatalogKind>(kind: K, id: string, signal?: AbortSignal): Promise<CatalogItemOf<K>> {
  // The page naming the item says itself when it is gone (404), so no global notice.
  const { data } = await apiClient.get<CatalogItemOf<K>>(`/catalog/${kind}/${encodeURIComponent(id)}`, { signal, skipErrorNotification: true });
  return data;
}

export const catalogItemQueryOptions = <K extends CatalogKind>(kind: K, id: string) =>
  queryOptions({ queryKey: catalogKeys.detail(kind, id), queryFn: ({ signal }) => getCatalogItem(kind, id, signal) });

export function useCatalogItem<K extends CatalogKind>(kind: K, id: string | null | undefined) {
  return useQuery({ ...catalogItemQueryOptions(kind, id ?? ''), enabled: Boolean(id) });
}
