import type { Finding, Remedy } from '../../types/finding';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy } from './envelope-common';
import { evaluateCandidatePans } from './pan-clearance';
import { lowestPoint, placedForSpec, type LowestPart } from './placed-engine';
import { GROUND_CLEARANCE_ID } from './pan-rules';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export { GROUND_CLEARANCE_ID } from './pan-rules';

/** How each part reads in the finding's sentence. */
export const LOWEST_PART_WORDS: Record<LowestPart, string> = {
  'oil pan': 'the oil pan',
  engine: 'the engine',
  transmission: 'the bellhousing or transmission case',
};

export function runGroundClearance(context: CheckContext): Finding {
  const { spec, settings } = context;
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
  const message = `The lowest point (${LOWEST_PART_WORDS[low.part]}, ${mmWithInches(low.point.x)} behind the front axle line) is ${mmWithInches(low.clearanceMm)} above the ground at ride height; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    // A shallower pan helps only when the pan is what hangs lowest.
    if (low.part === 'oil pan') {
      const shallow = evaluateCandidatePans(context, []).filter((c) => c.smallestMargin >= target);
      remedies.push({
        kind: 'part',
        category: 'oil-pan',
        requires: { railPattern: spec.engine.panRail.pattern, maxDepthBelowRailMm: Math.max(0, Math.round((-(spec.oilPan.sumpFloorW - spec.engine.panRail.w) + fig.margin - target) * 10) / 10) },
        partIds: shallow.map((c) => c.pan.id),
        note: shallow.length ? 'A shallower pan from the candidates keeps the clearance in this placement.' : 'No candidate pan is shallow enough; look for a shallower pan for the same bolt pattern.',
      });
    }
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
  // The lowest point rises one for one with the engine: an exact linear bound (only with a pan, like the check).
  windowTerms: (spec, settings, base) => {
    const low = base.pan ? lowestPoint(base, 0, spec.chassis) : null;
    if (!low) return {};
    const intercept = low.clearanceMm - settings.minGroundClearanceMm;
    return {
      constraints: [
        { bound: { checkId: GROUND_CLEARANCE_ID, against: 'ground' }, trend: 'rises', marginAt: (heightMm) => intercept + heightMm, linear: { intercept, slope: 1 } },
      ],
    };
  },
};
