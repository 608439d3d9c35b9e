import { pickupScreenPosition } from '../../oiling/oil-system';
import type { Finding, Remedy } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { mmRangeWithInches, mmWithInches } from '../../units/figure-format';
import { missingOilParts } from './pan-pickup-pump';

const FIELDS: FindingFields = {
  checkId: 'oiling.pickup-screen',
  group: 'oiling',
  title: 'Pickup screen over the sump',
  unit: 'mm',
  limit: 'min',
  thresholdSource: 'Common practice (no published source): the pickup screen sits over the sump, 1/4–3/8 in above its floor.',
};

export function checkPickupScreen({ spec, settings }: CheckContext): Finding {
  const { oilPan: pan, oilPickup: pickup } = spec;
  if (!pan || !pickup) return unknownFinding(FIELDS, missingOilParts(spec, ['oilPan', 'oilPickup']));
  const position = pickupScreenPosition(pan, pickup, settings.pickupSumpToleranceMm);
  const { pickupScreenMinGapMm: min, pickupScreenMaxGapMm: max } = settings;
  const belowMin = position.gapMm - min;
  const aboveMax = max - position.gapMm;
  const limit: 'min' | 'max' = belowMin <= aboveMax ? 'min' : 'max';
  const fields = { ...FIELDS, limit, against: pan.id };
  const remedies: Remedy[] = [
    {
      kind: 'part',
      category: 'oil-pickup',
      requires: { sumpPosition: pan.sumpPosition, mount: pan.pickupMount, screenU: pan.sumpCenterU, screenHeightAboveFloorMm: (min + max) / 2 },
      partIds: (spec.candidates?.oilPickups ?? [])
        .filter((p) => p.sumpPosition === pan.sumpPosition && p.mount === pan.pickupMount && p.pumpInlet === pickup.pumpInlet)
        .filter((p) => p.screenW - pan.sumpFloorW >= min && p.screenW - pan.sumpFloorW <= max)
        .map((p) => p.id),
      note: 'A pickup made for this pan, or this pickup set to the right height with the pan test-fitted (check with modelling clay on the screen).',
    },
  ];
  if (!position.overSump) {
    return measuredFinding(
      { ...fields, limit: 'match' },
      { measured: pickup.screenU, required: pan.sumpCenterU, margin: -1, status: 'fails' },
      `The pickup screen sits ${mmWithInches(pickup.screenU)} ahead of the bellhousing face, but the ${pan.name}'s sump is centred ${mmWithInches(pan.sumpCenterU)} ahead of it: the screen is not over the sump and would draw air at low oil level.`,
      remedies,
    );
  }
  const margin = Math.min(belowMin, aboveMax);
  const status = statusFromMargin(margin, settings.pickupScreenTightBandMm);
  const message = `The pickup screen sits ${mmWithInches(position.gapMm)} above the sump floor; it should be ${mmRangeWithInches(min, max)}.`;
  return measuredFinding(fields, { measured: position.gapMm, required: limit === 'min' ? min : max, margin, status }, message, remedies);
}

export const PICKUP_SCREEN_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkPickupScreen,
};
