import type {
  BellhousingAdapterSpec,
  EngineControllerSpec,
  MountAdapterSpec,
  OilPanSpec,
  OilPickupSpec,
  OilPumpSpec,
  SerpentineBeltSpec,
} from '../types/fit-spec';
import type { FitSpecKind } from './part-categories';

/**
 * Fitment attributes of a catalog part: what the planner's rules and the fit remedies' requirements read.
 * Known keys: sumpPosition, pickupMount, pumpInlet, railPattern, dipstickProvision (list), location (dipstick),
 * crankSignals, camSignals, throttles (lists), maxCylinders, enginePattern, transmissionPattern,
 * maxDxMm/maxDzMm/maxDyMm (what a mount adapter bridges), flowLph and pressurePsi (fuel pump), ratedKw,
 * inletSide, outletSide (radiator), type (throttle pedal), ribs, effectiveLengthMm, fabricationHours.
 */
export type PartAttributeValue = string | number | boolean | string[];
export type PartAttributes = Record<string, PartAttributeValue>;

/** The attributes a part has because it carries a fit spec: the fit check and the plan read the same figures. */
export function fitSpecAttributes(kind: FitSpecKind, spec: unknown): PartAttributes {
  switch (kind) {
    case 'oil-pans': {
      const pan = spec as OilPanSpec;
      return { railPattern: pan.railPattern, sumpPosition: pan.sumpPosition, pickupMount: pan.pickupMount, dipstickProvision: [...pan.dipstickProvision] };
    }
    case 'oil-pickups': {
      const pickup = spec as OilPickupSpec;
      return { sumpPosition: pickup.sumpPosition, pickupMount: pickup.mount, pumpInlet: pickup.pumpInlet };
    }
    case 'oil-pumps': {
      const pump = spec as OilPumpSpec;
      return { pumpInlet: pump.inlet, speedLimitRpm: pump.speedLimitRpm, highVolume: pump.highVolume };
    }
    case 'controllers': {
      const controller = spec as EngineControllerSpec;
      return {
        crankSignals: [...controller.crankSignals],
        camSignals: [...controller.camSignals],
        throttles: [...controller.throttles],
        maxCylinders: controller.maxCylinders,
      };
    }
    case 'mount-adapters': {
      const adapter = spec as MountAdapterSpec;
      return { maxDxMm: adapter.maxDxMm, maxDzMm: adapter.maxDzMm, maxDyMm: adapter.maxDyMm };
    }
    case 'bellhousing-adapters': {
      const adapter = spec as BellhousingAdapterSpec;
      return { enginePattern: adapter.enginePattern, transmissionPattern: adapter.transmissionPattern, thicknessMm: adapter.thicknessMm };
    }
    case 'belts': {
      const belt = spec as SerpentineBeltSpec;
      return { ribs: belt.ribs, effectiveLengthMm: belt.effectiveLengthMm };
    }
    default:
      return {};
  }
}

function lowerFirst(text: string): string {
  return text.charAt(0).toLowerCase() + text.slice(1);
}

/**
 * Whether a part's attributes meet one requirement of a fit remedy: `minFoo` asks for attribute `foo` at least
 * that figure; another number asks the attribute to be at least it (what an adapter bridges, a pump delivers);
 * text and true/false must match, or be in the part's list.
 */
export function meetsRequirement(attributes: PartAttributes, key: string, wanted: string | number | boolean): boolean {
  if (typeof wanted === 'number') {
    const name = /^min[A-Z]/.test(key) ? lowerFirst(key.slice(3)) : key;
    const have = attributes[name];
    return typeof have === 'number' && have >= wanted;
  }
  const have = attributes[key];
  if (Array.isArray(have)) return have.includes(String(wanted));
  return have === wanted;
}

/** The requirements a part misses, as `key` names (empty when it meets them all). */
export function missedRequirements(attributes: PartAttributes, requires: Record<string, string | number | boolean>): string[] {
  return Object.entries(requires)
    .filter(([key, wanted]) => !meetsRequirement(attributes, key, wanted))
    .map(([key]) => key);
}
