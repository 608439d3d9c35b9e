import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CatalogItem, CatalogItemChangesOf, CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

export type UpdateCatalogItemArgs<K extends CatalogKind = CatalogKind> = { kind: K; id: string; changes: CatalogItemChangesOf<K> };

export async function updateCatalogItem({ kind, id, changes }: UpdateCatalogItemArgs): Promise<CatalogItem> {
  const { data } = await apiClient.patch<CatalogItem>(`/catalog/${kind}/${encodeURIComponent(id)}`, changes, { skipErrorNotification: true });
  return data;
}

export function useUpdateCatalogItem({ onSuccess }: { onSuccess?: (item: CatalogItem) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateCatalogItem,
    onSuccess: (item, { kind }) => {
      queryClient.setQueryData(catalogKeys.detail(kind, item.id), item);
      void queryClient.invalidateQueries({ queryKey: catalogKeys.lists(kind) });
      onSuccess?.(item);
    },
  });
}
