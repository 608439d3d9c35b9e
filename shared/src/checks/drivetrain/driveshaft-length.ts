import { slipYokeEngagement } from '../../driveline/driveshaft-geometry';
import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { drivelineLayout } from './driveline-layout';
import { mmWithInches } from '../../units/figure-format';

const FIELDS: FindingFields = {
  checkId: 'drivetrain.driveshaft-length',
  group: 'drivetrain',
  title: 'Driveshaft length and slip-yoke engagement',
  unit: 'mm',
  limit: 'min',
  thresholdSource: 'Common practice (no published source): an inch of spline engagement left at full extension.',
};

export function checkDriveshaftLength({ spec, settings }: CheckContext): Finding {
  const result = drivelineLayout(spec);
  if (!result.ok) return unknownFinding(FIELDS, result.missing);
  const { line, transmission } = result.layout;
  const shaft = spec.driveshaft;
  const engagement = slipYokeEngagement({
    requiredLengthMm: line.lengthMm,
    slipYokeTravelMm: transmission.slipYokeTravelMm,
    existingLengthMm: shaft?.lengthMm,
    suspensionGrowthMm: shaft?.suspensionGrowthMm,
  });
  const required = settings.slipYokeMinEngagementMm;
  const margin = engagement.remainingMm - required;
  const status = statusFromMargin(margin, settings.tightBandMm);
  const lengthText = shaft?.lengthMm === undefined
    ? `A new driveshaft ${mmWithInches(line.lengthMm)} long (U-joint centre to centre) reaches the pinion`
    : `The driveshaft needs to be ${mmWithInches(line.lengthMm)} long and the existing one is ${mmWithInches(shaft.lengthMm)}`;
  const growthText = shaft?.suspensionGrowthMm ? ' at full droop' : ' (no suspension growth given)';
  const message = `${lengthText}; the slip yoke keeps ${mmWithInches(engagement.remainingMm)} of spline engagement${growthText}, at least ${mmWithInches(required)} is needed.`;
  return measuredFinding(
    { ...FIELDS, against: transmission.id },
    { measured: engagement.remainingMm, required, margin, status },
    message,
    [
      {
        kind: 'part',
        category: 'driveshaft',
        requires: { lengthMm: Math.round(line.lengthMm), minSlipYokeEngagementMm: required },
        partIds: [],
        note: `Have a driveshaft built to ${mmWithInches(line.lengthMm)} centre to centre with the slip yoke at its nominal engagement.`,
      },
    ],
  );
}

export const DRIVESHAFT_LENGTH_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: true,
  run: checkDriveshaftLength,
};
