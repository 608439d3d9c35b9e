import type { EngineSpec, OilPanSpec, OilPickupSpec } from '@swapwright/shared';
import { useCatalogItems } from '@/features/catalog/api/get-catalog-items';
import type { CatalogItem, CatalogKind } from '@/features/catalog/types';
import type { SelectionOption } from '@/features/fit-reports/components/selections-panel';

const ALL = { page: 1, pageSize: 100 } as const;

function useOptions(kind: CatalogKind, enabled: boolean) {
  const q = useCatalogItems(kind, ALL, { enabled });
  const items = (q.data?.items ?? []) as CatalogItem[];
  const options: SelectionOption[] = items.map((i) => ({ value: i.id, label: i.name }));
  return { items, options, loading: q.isPending && enabled };
}

/** Catalog entries for every slot of the fit selections, read once per page. */
export function useFitCatalog(enabled = true) {
  const engines = useOptions('engines', enabled);
  const chassis = useOptions('chassis', enabled);
  const transmissions = useOptions('transmissions', enabled);
  const pans = useOptions('oil-pans', enabled);
  const pickups = useOptions('oil-pickups', enabled);
  const pumps = useOptions('oil-pumps', enabled);
  const controllers = useOptions('controllers', enabled);
  const mountAdapters = useOptions('mount-adapters', enabled);
  return { engines, chassis, transmissions, pans, pickups, pumps, controllers, mountAdapters };
}

export type FitCatalog = ReturnType<typeof useFitCatalog>;

export function engineSpecOf(catalog: FitCatalog, engineId: string | null | undefined): EngineSpec | undefined {
  return catalog.engines.items.find((i) => i.id === engineId)?.spec as unknown as EngineSpec | undefined;
}

export function panOf(catalog: FitCatalog, id: string | null | undefined): OilPanSpec | undefined {
  return catalog.pans.items.find((i) => i.id === id)?.spec as unknown as OilPanSpec | undefined;
}

export function pickupsOf(catalog: FitCatalog): OilPickupSpec[] {
  return catalog.pickups.items.map((i) => ({ ...(i.spec as unknown as OilPickupSpec), id: i.id, name: i.name }));
}
