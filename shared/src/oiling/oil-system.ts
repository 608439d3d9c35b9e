import type { EnginePoint, OilPanSpec, OilPickupSpec, OilPumpSpec } from '../types/fit-spec';

/** Common practice (no published source): a crank-driven pump turns at crank speed, a cam-driven pump at half. */
export function oilPumpRpm(engineRpm: number, drive: 'crank' | 'cam'): number {
  return drive === 'crank' ? engineRpm : engineRpm / 2;
}

export interface OilSystemMismatch {
  field: 'railPattern' | 'sumpPosition' | 'pickupMount' | 'pumpInlet';
  message: string;
}

/** Everything that must agree between engine, pan, pickup and pump; empty when they agree. */
export function oilSystemMismatches(
  enginePanRailPattern: string,
  pan: OilPanSpec,
  pickup: OilPickupSpec,
  pump: OilPumpSpec,
): OilSystemMismatch[] {
  const found: OilSystemMismatch[] = [];
  if (pan.railPattern !== enginePanRailPattern) {
    found.push({ field: 'railPattern', message: `the pan's rail pattern ${pan.railPattern} does not match the block's ${enginePanRailPattern}` });
  }
  if (pickup.sumpPosition !== pan.sumpPosition) {
    found.push({ field: 'sumpPosition', message: `the pickup is for a ${pickup.sumpPosition} sump, the pan's sump is ${pan.sumpPosition}` });
  }
  if (pickup.mount !== pan.pickupMount) {
    found.push({ field: 'pickupMount', message: `the pickup mounts ${pickup.mount}, the pan expects ${pan.pickupMount}` });
  }
  if (pickup.pumpInlet !== pump.inlet) {
    found.push({ field: 'pumpInlet', message: `the pickup fits a ${pickup.pumpInlet} inlet, the pump has ${pump.inlet}` });
  }
  return found;
}

/**
 * Lowest w of the pan's bottom outline at a station u (the floor under that point), or null when u is outside
 * the outline. The outline is taken as a chain of segments, closed back to its first point.
 */
export function panFloorAt(bottomProfile: readonly EnginePoint[], u: number): number | null {
  let floor: number | null = null;
  const count = bottomProfile.length;
  if (count === 1) return bottomProfile[0].u === u ? bottomProfile[0].w : null;
  for (let i = 0; i < count; i += 1) {
    const a = bottomProfile[i];
    const b = bottomProfile[(i + 1) % count];
    const lo = Math.min(a.u, b.u);
    const hi = Math.max(a.u, b.u);
    if (u < lo || u > hi) continue;
    const w = a.u === b.u ? Math.min(a.w, b.w) : a.w + ((u - a.u) / (b.u - a.u)) * (b.w - a.w);
    floor = floor === null ? w : Math.min(floor, w);
  }
  return floor;
}

export interface PickupScreenPosition {
  /** Screen height above the sump floor (negative: below it, i.e. the pickup would hit the pan). */
  gapMm: number;
  /** True when the pan floor under the screen is the sump floor (within the tolerance). */
  overSump: boolean;
  floorUnderScreenW: number | null;
}

export function pickupScreenPosition(pan: OilPanSpec, pickup: OilPickupSpec, sumpToleranceMm: number): PickupScreenPosition {
  const floorUnderScreenW = panFloorAt(pan.bottomProfile, pickup.screenU);
  const overSump = floorUnderScreenW !== null && floorUnderScreenW <= pan.sumpFloorW + sumpToleranceMm;
  return { gapMm: pickup.screenW - pan.sumpFloorW, overSump, floorUnderScreenW };
}
