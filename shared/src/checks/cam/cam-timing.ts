import type { Finding } from '../../types/finding';
import { measuredFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';

const FIELDS: FindingFields = {
  checkId: 'cam.timing-advance',
  group: 'cam',
  title: 'Cam timing advance',
  unit: 'deg',
  limit: 'match',
  thresholdSource:
    "The cam maker's recommended installed advance; a cam with advance ground in is installed with the timing marks aligned (common practice, no published source).",
};

/** Installed advance = advance ground into the cam + advance set at the timing set (0 = marks aligned). */
export function totalCamAdvanceDeg(advanceGroundDeg: number, timingSetAdvanceDeg: number): number {
  return advanceGroundDeg + timingSetAdvanceDeg;
}

export function checkCamTiming({ spec, settings }: CheckContext): Finding {
  const cam = spec.engine.cam;
  const setAdvance = spec.timingSetAdvanceDeg ?? 0;
  const total = totalCamAdvanceDeg(cam.advanceGroundDeg, setAdvance);
  const recommended = cam.recommendedTotalDeg;
  // Compared at the precision the degrees are shown at (0.1°): a total a hair off the recommendation is on it.
  const difference = roundToShown(total - recommended);
  const margin = roundToShown(settings.camTimingToleranceDeg - Math.abs(difference));
  const status = margin < 0 ? 'fails' : difference === 0 ? 'ok' : 'tight';
  const setText = spec.timingSetAdvanceDeg === undefined ? 'the timing set at its marks (assumed)' : setAdvance === 0 ? 'the timing set at its marks' : `${fmt(setAdvance)} ${setAdvance > 0 ? 'advanced' : 'retarded'} at the timing set`;
  const direction = difference > 0 ? 'more advance than' : difference < 0 ? 'less advance than' : 'exactly';
  const message = `${fmt(cam.advanceGroundDeg)} ground into the cam plus ${setText} gives ${fmt(total)} installed, ${difference === 0 ? 'exactly' : `${fmt(Math.abs(difference))} ${direction}`} the recommended ${fmt(recommended)}.`;
  const setTo = recommended - cam.advanceGroundDeg;
  return measuredFinding({ ...FIELDS, against: spec.engine.id }, { measured: total, required: recommended, margin, status }, message, [
    {
      kind: 'part',
      category: 'cam-timing-set',
      requires: { advanceDeg: setTo },
      partIds: [],
      note:
        setTo === 0
          ? 'Install the timing set with its marks aligned: the cam already has its advance ground in. Degree the cam to confirm.'
          : `Set the timing set ${fmt(Math.abs(setTo))} ${setTo > 0 ? 'advanced' : 'retarded'} (a multi-keyway crank sprocket), then degree the cam to confirm.`,
    },
  ]);
}

/** Degrees are shown, and compared, to a tenth. */
const SHOWN_DECIMALS = 1;

function roundToShown(deg: number): number {
  const rounded = Number(deg.toFixed(SHOWN_DECIMALS));
  return rounded === 0 ? 0 : rounded;
}

function fmt(deg: number): string {
  const shown = roundToShown(deg);
  return `${Number.isInteger(shown) ? shown.toFixed(0) : shown.toFixed(SHOWN_DECIMALS)}°`;
}

export const CAM_TIMING_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkCamTiming,
};
