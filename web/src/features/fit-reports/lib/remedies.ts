import type { FitSpec, PartCategory, PlacementRemedy } from '@swapwright/shared';
import type { UnitsApi } from '@/hooks/use-units';
import type { FitSelectionKey } from '../types';

/** The fit selection a part category goes into, where the project can pick it. */
export const selectionKeyFor: Partial<Record<PartCategory, FitSelectionKey>> = {
  'oil-pan': 'oilPanId',
  'oil-pickup': 'oilPickupId',
  'oil-pump': 'oilPumpId',
  'engine-controller': 'controllerId',
  'accessory-drive': 'accessoryDriveId',
  'mount-adapter': 'mountAdapterId',
};

export const partNouns: Partial<Record<PartCategory, string>> = {
  'oil-pan': 'pan',
  'oil-pickup': 'pickup',
  'oil-pump': 'pump',
  'engine-controller': 'controller',
  'accessory-drive': 'drive',
  'mount-adapter': 'adapter',
  'bellhousing-adapter': 'adapter',
};

export const categoryLabels: Record<PartCategory, string> = {
  'oil-pan': 'Oil pan',
  'oil-pickup': 'Oil pickup',
  'oil-pump': 'Oil pump',
  'mount-adapter': 'Mount adapter',
  'bellhousing-adapter': 'Bellhousing adapter',
  'transmission-mount': 'Transmission mount',
  driveshaft: 'Driveshaft',
  'fuel-pump': 'Fuel pump',
  'fuel-regulator': 'Fuel regulator',
  injector: 'Injectors',
  'accessory-drive': 'Accessory drive',
  belt: 'Belt',
  radiator: 'Radiator',
  'engine-controller': 'Engine controller',
  'throttle-pedal': 'Throttle pedal',
  'cam-timing-set': 'Cam timing set',
  dipstick: 'Dipstick',
  'exhaust-manifold': 'Exhaust manifold',
};

export type PartInfo = { id: string; name: string; category?: PartCategory; sumpPosition?: string; mount?: string };

/** Names of every part the spec offers: the chosen ones and the candidates. */
export function partsOfSpec(spec: FitSpec | undefined): Record<string, PartInfo> {
  const out: Record<string, PartInfo> = {};
  if (!spec) return out;
  const add = (category: PartCategory, items: Array<{ id: string; name: string; sumpPosition?: string; mount?: string }> | undefined) => {
    for (const p of items ?? []) out[p.id] = { id: p.id, name: p.name, category, sumpPosition: p.sumpPosition, mount: p.mount };
  };
  const c = spec.candidates ?? {};
  add('oil-pan', [...(spec.oilPan ? [spec.oilPan] : []), ...(c.oilPans ?? [])]);
  add('oil-pickup', [...(spec.oilPickup ? [spec.oilPickup] : []), ...(c.oilPickups ?? [])]);
  add('oil-pump', [...(spec.oilPump ? [spec.oilPump] : []), ...(c.oilPumps ?? [])]);
  add('engine-controller', [...(spec.controller ? [spec.controller] : []), ...(c.controllers ?? [])]);
  add('mount-adapter', c.mountAdapters);
  add('bellhousing-adapter', c.bellhousingAdapters);
  add('accessory-drive', spec.engine.accessoryDrives);
  return out;
}

/** "Raise the engine 0.5 in", "Tilt the front up 1.5°". */
export function describePlacementRemedy(r: PlacementRemedy, units: Pick<UnitsApi, 'formatLength'>): string {
  const amount = r.unit === 'deg' ? `${Math.abs(r.changeBy).toFixed(1)}°` : units.formatLength(Math.abs(r.changeBy));
  if (r.axis === 'height') return `${r.changeBy >= 0 ? 'Raise' : 'Lower'} the engine ${amount}`;
  if (r.axis === 'setback') return `${r.changeBy >= 0 ? 'Set the engine back' : 'Move the engine forward'} ${amount}`;
  return `Tilt the front ${r.changeBy >= 0 ? 'up' : 'down'} ${amount}`;
}
