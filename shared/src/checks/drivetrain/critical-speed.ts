import { CRITICAL_SPEED_SOURCES, driveshaftCriticalSpeedRpm } from '../../driveline/critical-speed';
import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { describeShaftSpeed, drivelineLayout } from './driveline-layout';
import { mmWithInches } from '../../units/figure-format';

const FIELDS: FindingFields = {
  checkId: 'drivetrain.critical-speed',
  group: 'drivetrain',
  title: 'Driveshaft critical speed',
  unit: 'rpm',
  limit: 'max',
  thresholdSource: `${CRITICAL_SPEED_SOURCES.steel}; keep shaft speed at or under 75 % of critical (common practice).`,
};

export function checkCriticalSpeed({ spec, settings }: CheckContext): Finding {
  const result = drivelineLayout(spec);
  const missing = result.ok ? [] : [...result.missing];
  if (!spec.driveshaft) missing.push('driveshaft');
  if (!result.ok || !spec.driveshaft) return unknownFinding(FIELDS, missing);
  const { line, shaftSpeed } = result.layout;
  if (!shaftSpeed) return unknownFinding(FIELDS, ['goals.revLimitRpm', 'transmission.topGearRatio']);
  const shaft = spec.driveshaft;
  const criticalRpm = driveshaftCriticalSpeedRpm(shaft.outerDiameterMm, shaft.wallMm, line.lengthMm, shaft.material);
  const allowedRpm = settings.criticalSpeedFraction * criticalRpm;
  const margin = allowedRpm - shaftSpeed.rpm;
  const status = statusFromMargin(margin, settings.shaftSpeedTightBandRpm);
  const tube = `${mmWithInches(shaft.outerDiameterMm)} × ${mmWithInches(shaft.wallMm, { decimals: 2 })} wall ${shaft.material} tube`;
  const message = `A ${tube}, ${mmWithInches(line.lengthMm)} long, has a critical speed of ${Math.round(criticalRpm)} rpm; the shaft turns ${describeShaftSpeed(shaftSpeed)}, against an allowed ${Math.round(allowedRpm)} rpm (${Math.round(settings.criticalSpeedFraction * 100)} % of critical).`;
  const thresholdSource = `${CRITICAL_SPEED_SOURCES[shaft.material]}; keep shaft speed at or under 75 % of critical (common practice).`;
  return measuredFinding({ ...FIELDS, thresholdSource }, { measured: shaftSpeed.rpm, required: allowedRpm, margin, status }, message, [
    {
      kind: 'part',
      category: 'driveshaft',
      requires: { lengthMm: Math.round(line.lengthMm), minCriticalSpeedRpm: Math.ceil(shaftSpeed.rpm / settings.criticalSpeedFraction) },
      partIds: [],
      note: 'A larger-diameter tube raises the critical speed; a two-piece shaft with a carrier bearing shortens each span.',
    },
  ]);
}

export const CRITICAL_SPEED_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: true,
  run: checkCriticalSpeed,
};
