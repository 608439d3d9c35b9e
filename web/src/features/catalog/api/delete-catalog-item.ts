import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CatalogKind } from '../types';
import { catalogKeys } from './catalog-keys';

export type DeleteCatalogItemArgs = { kind: CatalogKind; id: string };

export async function deleteCatalogItem({ kind, id }: DeleteCatalogItemArgs): Promise<void> {
  await apiClient.delete(`/catalog/${kind}/${encodeURIComponent(id)}`);
}

export function useDeleteCatalogItem() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: deleteCatalogItem,
    onSuccess: (_, { kind, id }) => {
      queryClient.removeQueries({ queryKey: catalogKeys.detail(kind, id) });
      void queryClient.invalidateQueries({ queryKey: catalogKeys.lists(kind) });
    },
  });
}
