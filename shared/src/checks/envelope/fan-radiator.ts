import { xGapBehindPlane } from '../../geometry/plane-gap';
import type { Finding, Remedy } from '../../types/finding';
import type { ChassisPoint, FitSpec } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy } from './envelope-common';
import { placedForSpec, placeEngine, type PlacedEngine } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export const FAN_RADIATOR_ID = 'envelope.fan-radiator';

export interface FanGap {
  gap: number;
  point: ChassisPoint;
  feature: 'fan' | 'front pulley';
}

/** x-gap from the fan face and the front face of the accessory drive to the rear face of the radiator core. */
export function measureFanGap(placed: PlacedEngine, coreX: number): FanGap | null {
  const fan = xGapBehindPlane(placed.fanFace, coreX);
  const drive = xGapBehindPlane(placed.driveFace, coreX);
  if (!fan && !drive) return null;
  if (drive && (!fan || drive.gap < fan.gap)) return { gap: drive.gap, point: drive.point, feature: 'front pulley' };
  return { gap: fan!.gap, point: fan!.point, feature: 'fan' };
}

export function runFanRadiator({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: FAN_RADIATOR_ID,
    group: 'envelope' as const,
    title: 'Fan and front pulley to radiator core',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE}: an inch between fan and core (the shop's minimum fan to radiator core gap).`,
    against: 'radiator-core',
  };
  const core = spec.chassis.radiatorCore;
  if (!core || !Number.isFinite(core.x)) return unknownFinding(fields, ['chassis.radiatorCore']);
  if (!Number.isFinite(spec.engine.fanFrontU)) return unknownFinding(fields, ['engine.fanFrontU']);
  const g = measureFanGap(placedForSpec(spec), core.x) as FanGap;
  const fig = figures(g.gap, settings.minFanToCoreMm, settings);
  const message =
    g.gap >= 0
      ? `The ${g.feature} is ${mmWithInches(g.gap)} behind the radiator core; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The ${g.feature} reaches ${mmWithInches(-g.gap)} past the rear face of the radiator core; it needs ${mmWithInches(-fig.margin)} more room.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    const shift = target - fig.margin;
    remedies.push(placementRemedy('setback', shift, `Set the engine back ${mmWithInches(shift)} (the gap to the core grows one for one); recheck the firewall and driveshaft.`));
    if (g.feature === 'front pulley') {
      const fits = shorterDrives(spec, core.x, settings.minFanToCoreMm + target);
      remedies.push({
        kind: 'part',
        category: 'accessory-drive',
        requires: { maxFrontFaceU: Math.floor((placedForSpec(spec).drive?.frontFaceU ?? 0) - shift) },
        partIds: fits,
        note: fits.length ? 'A shorter accessory drive from the engine\'s options clears the core in this placement.' : 'No listed accessory drive is short enough; look for a shorter front drive.',
      });
    } else {
      remedies.push({ kind: 'part', category: 'radiator', requires: { electricFan: true }, partIds: [], note: 'An electric puller fan on the core frees the space the engine fan needs.' });
    }
    remedies.push({
      kind: 'fabrication',
      operation: 'Move the radiator support forward',
      laborHours: settings.radiatorSupportFabricationHours,
      note: `The core has to move ${mmWithInches(shift)} forward; check the hood latch and grille.`,
    });
  }
  return measuredFinding(fields, fig, message, remedies);
}

function shorterDrives(spec: FitSpec, coreX: number, need: number): string[] {
  return (spec.engine.accessoryDrives ?? [])
    .filter((d) => d.id !== placedForSpec(spec).drive?.id)
    .map((d) => ({ d, g: measureFanGap(placeEngine({ ...spec, accessoryDriveId: d.id }), coreX) }))
    .filter((e) => e.g && e.g.gap >= need)
    .sort((a, b) => (b.g?.gap ?? 0) - (a.g?.gap ?? 0))
    .map((e) => e.d.id);
}

export const FAN_RADIATOR_CHECK: CheckDefinition = {
  id: FAN_RADIATOR_ID,
  group: 'envelope',
  title: 'Fan and front pulley to radiator core',
  dependsOnPlacement: true,
  run: runFanRadiator,
  // Height does not move the fan toward the core: a constant margin for the column.
  windowTerms: (spec, settings, base) => {
    const core = spec.chassis.radiatorCore;
    if (!core || !Number.isFinite(spec.engine.fanFrontU)) return {};
    const fan = measureFanGap(base, core.x);
    return fan ? { constants: [{ bound: { checkId: FAN_RADIATOR_ID, against: 'radiator-core' }, margin: fan.gap - settings.minFanToCoreMm }] } : {};
  },
};
