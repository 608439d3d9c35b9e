import type { EngineSpec, FitSpec, OilPanSpec, OilPickupSpec } from '@swapwright/shared';
import { createElement, useMemo } from 'react';
import { Link } from 'react-router-dom';
import { toCatalogKind } from '@/config/paths';
import { useCatalogItems } from '@/features/catalog/api/get-catalog-items';
import type { CatalogItem, CatalogKind } from '@/features/catalog/types';
import type { SelectionOption, SelectionSlot } from '@/features/fit-reports/components/selections-panel';
import { partsOfSpec, type PartInfo } from '@/features/fit-reports/lib/remedies';
import type { FitSelectionKey, FitSelections, FitSelectionsInput } from '@/features/fit-reports/types';
import type { Project } from '@/features/projects/types';

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

export function pickupsOf(catalog: FitCatalog): OilPickupSpec[] {
  return catalog.pickups.items.map((i) => ({ ...(i.spec as unknown as OilPickupSpec), id: i.id, name: i.name }));
}

export function pansOf(catalog: FitCatalog): OilPanSpec[] {
  return catalog.pans.items.map((i) => ({ ...(i.spec as unknown as OilPanSpec), id: i.id, name: i.name }));
}

/** Names of the parts remedies may point at: the report's own and the catalog's. */
export function usePartNames(spec: FitSpec | undefined, catalog: FitCatalog): Record<string, PartInfo> {
  const { pans, pickups, pumps, controllers } = catalog;
  return useMemo(() => {
    const names = partsOfSpec(spec);
    for (const i of [...pans.items, ...pickups.items, ...pumps.items, ...controllers.items]) names[i.id] ??= { id: i.id, name: i.name };
    return names;
  }, [spec, pans.items, pickups.items, pumps.items, controllers.items]);
}

export type SelectionSlotsOptions = {
  project: Project;
  catalog: FitCatalog;
  selections: FitSelections | undefined;
  selectionsLoading: boolean;
  /** The engine the project uses (its accessory drives fill the drive slot). */
  engineSpec: EngineSpec | undefined;
  canPickSelections: boolean;
  canPickProjectParts: boolean;
  /** Whether the person keeps the catalog (empty pickers then link to adding that kind). */
  canAddToCatalog: boolean;
  savingSelections: boolean;
  savingProject: boolean;
  onSelect: (patch: FitSelectionsInput) => void;
  onProjectPart: (changes: Partial<Pick<Project, ProjectPartKey>>) => void;
};

type ProjectPartKey = 'engineProfileId' | 'chassisModelId' | 'transmissionId';

/** Where an empty picker sends a person who may add to the catalog: that kind's tab of the catalog. */
function addInCatalog(kind: CatalogKind, words: string, canAdd: boolean) {
  if (!canAdd) return `None in the catalog yet: ask the owner, an estimator or the parts counter to add ${words}.`;
  return createElement(Link, { to: toCatalogKind(kind) }, `Add ${words} in the catalog`);
}

/** The slots of "What goes in": engine, chassis and transmission on the project, the rest in the fit selections. */
export function selectionSlots(o: SelectionSlotsOptions): SelectionSlot[] {
  const { catalog, selections: sel } = o;
  const empty = (kind: CatalogKind, words: string) => addInCatalog(kind, words, o.canAddToCatalog);
  const slot = (key: FitSelectionKey, label: string, options: SelectionOption[], loading: boolean, emptyHelp?: SelectionSlot['emptyHelp']): SelectionSlot => ({
    key,
    label,
    value: sel?.[key] ?? null,
    options,
    loading: loading || o.selectionsLoading,
    disabled: !o.canPickSelections || o.savingSelections,
    onChange: (v) => o.onSelect({ [key]: v }),
    emptyHelp,
  });
  const projectSlot = (key: ProjectPartKey, label: string, options: SelectionOption[], loading: boolean, emptyHelp: SelectionSlot['emptyHelp']): SelectionSlot => ({
    key,
    label,
    value: o.project[key],
    options,
    loading,
    disabled: !o.canPickProjectParts || o.savingProject,
    onChange: (v) => o.onProjectPart({ [key]: v }),
    emptyHelp,
  });
  return [
    projectSlot('engineProfileId', 'Engine', catalog.engines.options, catalog.engines.loading, empty('engines', 'an engine')),
    projectSlot('chassisModelId', 'Chassis', catalog.chassis.options, catalog.chassis.loading, empty('chassis', 'a chassis')),
    projectSlot('transmissionId', 'Transmission', catalog.transmissions.options, catalog.transmissions.loading, empty('transmissions', 'a transmission')),
    slot('oilPanId', 'Oil pan', catalog.pans.options, catalog.pans.loading, empty('oil-pans', 'an oil pan')),
    slot('oilPickupId', 'Oil pickup', catalog.pickups.options, catalog.pickups.loading, empty('oil-pickups', 'an oil pickup')),
    slot('oilPumpId', 'Oil pump', catalog.pumps.options, catalog.pumps.loading, empty('oil-pumps', 'an oil pump')),
    slot('controllerId', 'Engine controller', catalog.controllers.options, catalog.controllers.loading, empty('controllers', 'an engine controller')),
    slot(
      'accessoryDriveId',
      'Accessory drive',
      (o.engineSpec?.accessoryDrives ?? []).map((d) => ({ value: d.id, label: d.name })),
      false,
      o.engineSpec ? addInCatalog('engines', "an accessory drive to the engine's entry", o.canAddToCatalog) : 'Choose an engine first: its accessory drives are offered here.',
    ),
    slot('mountAdapterId', 'Mount adapter', catalog.mountAdapters.options, catalog.mountAdapters.loading, empty('mount-adapters', 'a mount adapter')),
  ];
}
