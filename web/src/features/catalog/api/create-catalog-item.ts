import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CatalogItem, CatalogItemInputOf, CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

/** The form builds the body from the kind's field list, so it is typed by the kind only where the caller knows it. */
export type CreateCatalogItemArgs<K extends CatalogKind = CatalogKind> = { kind: K; input: CatalogItemInputOf<K> };

export async function createCatalogItem({ kind, input }: CreateCatalogItemArgs): Promise<CatalogItem> {
  const { data } = await apiClient.post<CatalogItem>(`/catalog/${kind}`, input, { skipErrorNotification: true });
  return data;
}

export function useCreateCatalogItem({ onSuccess }: { onSuccess?: (item: CatalogItem) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: createCatalogItem,
    onSuccess: (item, { kind }) => {
      queryClient.setQueryData(catalogKeys.detail(kind, item.id), item);
      void queryClient.invalidateQueries({ queryKey: catalogKeys.lists(kind) });
      onSuccess?.(item);
    },
  });
}
