import type { Finding, Remedy } from '../../types/finding';
import type { ChassisPoint, ChassisSpec } from '../../types/fit-spec';
import { groundZAt } from '../../geometry/ground-line';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy } from './envelope-common';
import { evaluateCandidatePans } from './pan-clearance';
import { placedForSpec, type PlacedEngine } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';

export const GROUND_CLEARANCE_ID = 'envelope.ground-clearance';

export interface LowestPoint {
  point: ChassisPoint;
  part: 'oil pan' | 'engine';
  /** Height above the ground under it (the ground is z = 0 at ride height, or the chassis's measured ground line). */
  clearanceMm: number;
}

/** The point of the placed engine and pan nearest the ground. */
export function lowestPoint(placed: PlacedEngine, dz = 0, chassis?: Pick<ChassisSpec, 'groundLine' | 'wheelbaseMm'>): LowestPoint | null {
  let best: LowestPoint | null = null;
  const visit = (points: readonly ChassisPoint[] | null, part: 'oil pan' | 'engine'): void => {
    for (const p of points ?? []) {
      const clearanceMm = p.z + dz - (chassis ? groundZAt(chassis, p.x) : 0);
      if (best === null || clearanceMm < best.clearanceMm) best = { point: { x: p.x, z: p.z + dz }, part, clearanceMm };
    }
  };
  visit(placed.pan, 'oil pan');
  visit(placed.topProfile, 'engine');
  visit(placed.rearProfile, 'engine');
  return best;
}

export function runGroundClearance({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: GROUND_CLEARANCE_ID,
    group: 'envelope' as const,
    title: 'Ground clearance under the engine',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE}: about 4 in under the lowest point of a street truck (the shop's minimum ground clearance).`,
    against: 'ground',
  };
  if (!spec.oilPan || spec.oilPan.bottomProfile.length < 3) return unknownFinding(fields, ['oilPan.bottomProfile']);
  const low = lowestPoint(placedForSpec(spec), 0, spec.chassis);
  if (!low) return unknownFinding(fields, ['oilPan.bottomProfile']);
  const fig = figures(low.clearanceMm, settings.minGroundClearanceMm, settings);
  const message = `The lowest point (${low.part}, ${mmWithInches(low.point.x)} behind the front axle line) is ${mmWithInches(low.clearanceMm)} above the ground at ride height; at least ${mmWithInches(fig.required)} is required, a margin of ${mmWithInches(fig.margin)}.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    const shallow = evaluateCandidatePans(spec, settings, []).filter(
      (c) => c.smallestMargin >= (fig.status === 'fails' ? 0 : settings.tightBandMm),
    );
    remedies.push({
      kind: 'part',
      category: 'oil-pan',
      requires: { railPattern: spec.engine.panRail.pattern, maxDepthBelowRailMm: Math.max(0, Math.round((-(spec.oilPan.sumpFloorW - spec.engine.panRail.w) + fig.margin - target) * 10) / 10) },
      partIds: shallow.map((c) => c.pan.id),
      note: shallow.length ? 'A shallower pan from the candidates keeps the clearance in this placement.' : 'No candidate pan is shallow enough; look for a shallower pan for this rail.',
    });
    // Ground clearance rises one for one with the engine.
    const raise = target - fig.margin;
    remedies.push(placementRemedy('height', raise, `Raise the engine ${mmWithInches(raise)}; the hood clearance drops by the same amount.`));
  }
  return measuredFinding(fields, fig, message, remedies);
}

export const GROUND_CLEARANCE_CHECK: CheckDefinition = {
  id: GROUND_CLEARANCE_ID,
  group: 'envelope',
  title: 'Ground clearance under the engine',
  dependsOnPlacement: true,
  run: runGroundClearance,
};
