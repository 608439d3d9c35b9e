import { verticalClearance, type VerticalClearance } from '../../geometry/vertical-clearance';
import type { Finding, Remedy } from '../../types/finding';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy } from './envelope-common';
import { placedForSpec, type PlacedEngine } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export const HOOD_ID = 'envelope.hood';

/** Vertical clearance from the placed top profile to the underside of the hood; null when they share no x. */
export function measureHood(placed: PlacedEngine, hoodLine: readonly { x: number; z: number }[] | undefined, dz = 0): VerticalClearance | null {
  if (!hoodLine || hoodLine.length < 2 || placed.topProfile.length === 0) return null;
  return verticalClearance(placed.topProfile, hoodLine, dz);
}

export function runHood({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: HOOD_ID,
    group: 'envelope' as const,
    title: 'Hood to top of engine',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE}: half an inch for hood flex and engine rock (the shop's minimum clearance under the hood).`,
    against: 'hood',
  };
  const missing: string[] = [];
  if (!spec.engine.topProfile || spec.engine.topProfile.length === 0) missing.push('engine.topProfile');
  if (!spec.chassis.hoodLine || spec.chassis.hoodLine.length < 2) missing.push('chassis.hoodLine');
  if (missing.length) return unknownFinding(fields, missing);
  const c = measureHood(placedForSpec(spec), spec.chassis.hoodLine);
  if (!c) {
    return unknownFinding(fields, ['chassis.hoodLine'], 'Cannot check the hood: the hood line does not reach over the top of the engine; extend the hood line measurement.');
  }
  const fig = figures(c.clearance, settings.minHoodGapMm, settings);
  const message =
    c.clearance >= 0
      ? `The top of the engine is ${mmWithInches(c.clearance)} under the hood at ${mmWithInches(c.from.x)} behind the axle line; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The top of the engine stands ${mmWithInches(-c.clearance)} above the underside of the hood at ${mmWithInches(c.from.x)} behind the axle line; it needs ${mmWithInches(-fig.margin)} more room.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    const drop = target - fig.margin;
    remedies.push(placementRemedy('height', -drop, `Lower the engine ${mmWithInches(drop)} (hood clearance changes one for one); recheck the pan and ground clearance.`));
    remedies.push({
      kind: 'fabrication',
      operation: 'Fit a cowl or scoop hood, or a lower air-cleaner base',
      laborHours: settings.hoodFabricationHours,
      note: `The top of the engine needs ${mmWithInches(drop)} more room.`,
    });
  }
  return measuredFinding(fields, fig, message, remedies);
}

export const HOOD_CHECK: CheckDefinition = {
  id: HOOD_ID,
  group: 'envelope',
  title: 'Hood to top of engine',
  dependsOnPlacement: true,
  run: runHood,
  // The hood gap shrinks one for one as the engine rises: an exact linear bound.
  windowTerms: (spec, settings, base) => {
    const hood = measureHood(base, spec.chassis.hoodLine);
    if (!hood) return {};
    const intercept = hood.clearance - settings.minHoodGapMm;
    return {
      constraints: [{ bound: { checkId: HOOD_ID, against: 'hood' }, trend: 'falls', marginAt: (heightMm) => intercept - heightMm, linear: { intercept, slope: -1 } }],
    };
  },
};
