import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { CatalogItem, CatalogItemInput, CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

export type CreateCatalogItemArgs = { kind: CatalogKind; input: CatalogItemInput };

export async function createCatalogItem({ kind, input }: CreateCatalogItemArgs): Promise<CatalogItem> {
  const { data } = await apiClient.post<CatalogItem>(`/catalog/${kind}`, input, { skipErrorNotification: true });
  return data;
}

export function useCreateCatalogItem({ onSuccess }: { onSuccess?: (item: CatalogItem) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCatalogItem,
    onSuccess: (item, { kind }) => {
      queryClient.setQueryData(catalogKeys.detail(kind, item.id), item);
      void queryClient.invalidateQueries({ queryKey: catalogKeys.lists(kind) });
      onSuccess?.(item);
    },
  });
}
