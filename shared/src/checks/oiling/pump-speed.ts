import { oilPumpRpm } from '../../oiling/oil-system';
import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';

const FIELDS: FindingFields = {
  checkId: 'oiling.pump-speed',
  group: 'oiling',
  title: 'Oil pump speed at the rev limit',
  unit: 'rpm',
  limit: 'max',
  thresholdSource:
    "The pump's rated speed; a stock pump with no rating of its own is flagged above about 6,000 rpm at crank speed (common practice, no published source).",
};

/** A pump with no positive speed rating is treated as a stock pump. */
export function statedPumpLimitRpm(speedLimitRpm: number): number | null {
  return Number.isFinite(speedLimitRpm) && speedLimitRpm > 0 ? speedLimitRpm : null;
}

export function checkOilPumpSpeed({ spec, settings }: CheckContext): Finding {
  const pump = spec.oilPump;
  if (!pump) return unknownFinding(FIELDS, ['oilPump']);
  const revLimitRpm = spec.goals.revLimitRpm;
  if (revLimitRpm === undefined) return unknownFinding(FIELDS, ['goals.revLimitRpm']);
  const drive = spec.engine.oilPumpDrive;
  const pumpRpm = oilPumpRpm(revLimitRpm, drive);
  const stated = statedPumpLimitRpm(pump.speedLimitRpm);
  const limitRpm = stated ?? settings.stockOilPumpLimitRpm;
  const margin = limitRpm - pumpRpm;
  const status = statusFromMargin(margin, settings.oilPumpTightBandRpm);
  const driveText = drive === 'crank' ? 'at crank speed' : 'at half crank speed from the cam';
  const limitText = stated === null ? `the stock-pump limit of ${Math.round(limitRpm)} rpm` : `its rating of ${Math.round(limitRpm)} rpm`;
  const message = `The ${pump.name} turns ${driveText}: ${Math.round(pumpRpm)} rpm at the ${Math.round(revLimitRpm)} rpm rev limit, against ${limitText}.`;
  const inlet = spec.oilPickup?.pumpInlet ?? pump.inlet;
  const partIds = (spec.candidates?.oilPumps ?? [])
    .filter((p) => p.inlet === inlet && (statedPumpLimitRpm(p.speedLimitRpm) ?? 0) >= pumpRpm + settings.oilPumpTightBandRpm)
    .sort((a, b) => a.speedLimitRpm - b.speedLimitRpm)
    .map((p) => p.id);
  return measuredFinding({ ...FIELDS, against: pump.id }, { measured: pumpRpm, required: limitRpm, margin, status }, message, [
    {
      kind: 'part',
      category: 'oil-pump',
      requires: { minSpeedLimitRpm: Math.ceil(pumpRpm + settings.oilPumpTightBandRpm), inlet },
      partIds,
      note: 'A pump rated for the rev limit, with the inlet the pickup fits; or lower the planned rev limit.',
    },
  ]);
}

export const OIL_PUMP_SPEED_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkOilPumpSpeed,
};
