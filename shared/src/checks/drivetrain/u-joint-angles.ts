import { maxOperatingAngleAtSpeed } from '../../driveline/operating-angles';
import type { Finding, Remedy } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { describeShaftSpeed, drivelineLayout, type DrivelineLayout } from './driveline-layout';
import type { FitSettings } from '../../settings/fit-settings';
import type { CheckStatus } from '../../types/finding';
import type { FitSpec } from '../../types/fit-spec';
import { formatDegrees } from '../../units/figure-format';

export const U_JOINT_ANGLES_ID = 'drivetrain.u-joint-angles';

const FIELDS: FindingFields = {
  checkId: U_JOINT_ANGLES_ID,
  group: 'drivetrain',
  title: 'U-joint operating angles',
  unit: 'deg',
  limit: 'max',
  thresholdSource:
    'Published driveline-maker guidance: each joint at least 1/2°, front and rear within 1°, at most 3° for vibration-free running, and a maximum that falls with shaft speed.',
};

interface Constraint {
  name: string;
  measured: number;
  required: number;
  limit: 'min' | 'max';
  margin: number;
}

/** The U-joint rule: the governing constraint (smallest margin) and the status, without the sentence. */
function uJointRule(layout: DrivelineLayout, settings: FitSettings): { governing: Constraint; status: CheckStatus; speedMaxDeg: number; overSmoothLimit: boolean } {
  const { angles, shaftSpeed } = layout;
  const speedMaxDeg = shaftSpeed
    ? maxOperatingAngleAtSpeed(shaftSpeed.rpm, settings.uJointMaxAngleBySpeed, settings.uJointMinDeg)
    : settings.uJointMaxDeg;
  const largest = Math.max(angles.frontDeg, angles.rearDeg);
  const smallest = Math.min(angles.frontDeg, angles.rearDeg);
  const constraints: Constraint[] = [
    { name: 'largest joint angle', measured: largest, required: speedMaxDeg, limit: 'max', margin: speedMaxDeg - largest },
    {
      name: 'front–rear difference',
      measured: angles.differenceDeg,
      required: settings.uJointMaxDifferenceDeg,
      limit: 'max',
      margin: settings.uJointMaxDifferenceDeg - angles.differenceDeg,
    },
    { name: 'smallest joint angle', measured: smallest, required: settings.uJointMinDeg, limit: 'min', margin: smallest - settings.uJointMinDeg },
  ];
  const governing = constraints.reduce((worst, c) => (c.margin < worst.margin ? c : worst));
  let status = statusFromMargin(governing.margin, settings.uJointTightBandDeg);
  const overSmoothLimit = largest > settings.uJointMaxDeg;
  if (status === 'ok' && overSmoothLimit) status = 'tight';
  return { governing, status, speedMaxDeg, overSmoothLimit };
}

/**
 * The U-joint margin (degrees), status and the side of the governing limit (`max`: an angle too large or the
 * front and rear too different; `min`: a joint too straight) at the spec's placement; null without a
 * transmission. Cheap: no sentence.
 */
export function uJointRoom(spec: FitSpec, settings: FitSettings): { marginDeg: number; status: CheckStatus; limit: 'min' | 'max' } | null {
  const result = drivelineLayout(spec);
  if (!result.ok) return null;
  const { governing, status } = uJointRule(result.layout, settings);
  return { marginDeg: governing.margin, status, limit: governing.limit };
}

export function checkUJointAngles({ spec, settings }: CheckContext): Finding {
  const result = drivelineLayout(spec);
  if (!result.ok) return unknownFinding(FIELDS, result.missing);
  const { angles, shaftSpeed, transmission } = result.layout;
  const { governing, status, speedMaxDeg, overSmoothLimit } = uJointRule(result.layout, settings);
  const speedText = shaftSpeed ? ` (${describeShaftSpeed(shaftSpeed)}, maximum ${formatDegrees(speedMaxDeg, 1)})` : '';
  const figures = `Front joint ${formatDegrees(angles.frontDeg)}, rear ${formatDegrees(angles.rearDeg)}, difference ${formatDegrees(angles.differenceDeg)}; shaft at ${formatDegrees(angles.shaftDeg)}, transmission ${formatDegrees(angles.transmissionDeg)}, pinion ${formatDegrees(angles.pinionDeg)}${speedText}.`;
  let verdict: string;
  if (status === 'fails') {
    verdict = ` The ${governing.name} is ${formatDegrees(governing.measured)} against a ${governing.limit === 'max' ? 'maximum' : 'minimum'} of ${formatDegrees(governing.required)}.`;
  } else if (status === 'tight' && governing.margin >= settings.uJointTightBandDeg && overSmoothLimit) {
    verdict = ` Above ${formatDegrees(settings.uJointMaxDeg, 1)} the joints will not run vibration-free.`;
  } else if (status === 'tight') {
    verdict = ` The ${governing.name} is within ${formatDegrees(settings.uJointTightBandDeg)} of its limit of ${formatDegrees(governing.required)}.`;
  } else {
    verdict = ' Within the limits.';
  }
  return measuredFinding(
    { ...FIELDS, limit: governing.limit, against: transmission.id },
    { measured: governing.measured, required: governing.required, margin: governing.margin, status },
    figures + verdict,
    uJointRemedies(angles.transmissionDeg, angles.pinionDeg, settings.pinionAngleShimHours),
  );
}

function uJointRemedies(transmissionDeg: number, pinionDeg: number, shimHours: number): Remedy[] {
  return [
    {
      kind: 'fabrication',
      operation: `Set the pinion angle to ${formatDegrees(transmissionDeg, 1)}, parallel to the transmission (now ${formatDegrees(pinionDeg, 1)})`,
      laborHours: shimHours,
      note: 'Wedge shims or adjustable arms. Support the axle on stands rated for the load before loosening it; recheck both joint angles at ride height.',
    },
    {
      kind: 'fabrication',
      operation: 'Raise or lower the transmission crossmember to even out the U-joint angles',
      laborHours: 2,
      operationCode: 'transmission-crossmember',
      note: 'Moving the transmission also changes the installed tilt; rerun the fit check afterwards.',
    },
  ];
}

export const U_JOINT_ANGLES_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: true,
  run: checkUJointAngles,
};
