import type { OilPanSpec, OilPickupSpec } from '../types/fit-spec';

/**
 * A pickup suits a pan when it reaches into the pan's sump (same sump position) and mounts the way the pan
 * provides for (same pickup mounting); with a pump inlet given, it must also fit the pump.
 */
export function pickupSuitsPan(pickup: OilPickupSpec, pan: OilPanSpec, pumpInlet?: string): boolean {
  return pickup.sumpPosition === pan.sumpPosition && pickup.mount === pan.pickupMount && (pumpInlet === undefined || pickup.pumpInlet === pumpInlet);
}

/** What to do with the pickup when a new pan is chosen. */
export type PickupForPan =
  /** The current pickup already suits the new pan. */
  | { action: 'keep'; pickup: OilPickupSpec }
  /** Change to this pickup, the first of the offered ones that suits the new pan. */
  | { action: 'change'; pickup: OilPickupSpec }
  /** None of the offered pickups suits the new pan: the person has to find one. */
  | { action: 'none-suits'; pickup: null };

/**
 * The pickup that goes with a newly chosen pan: the current one when it suits, else the first of `offered`
 * that suits (preferring one that also fits the pump's inlet, when given).
 */
export function pickupForNewPan(
  pan: OilPanSpec,
  current: OilPickupSpec | null | undefined,
  offered: readonly OilPickupSpec[],
  pumpInlet?: string,
): PickupForPan {
  if (current && pickupSuitsPan(current, pan)) return { action: 'keep', pickup: current };
  const match = (pumpInlet !== undefined ? offered.find((p) => pickupSuitsPan(p, pan, pumpInlet)) : undefined) ?? offered.find((p) => pickupSuitsPan(p, pan));
  return match ? { action: 'change', pickup: match } : { action: 'none-suits', pickup: null };
}
