import { injectorFlowAtPressure, lbhToCcPerMin, requiredInjectorFlowLbh } from '../../fuel/fuel-flow';
import type { Finding } from '../../types/finding';
import { kwToHp } from '../../units/quantities';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { FUEL_SYSTEM_CAUTION } from './fuel-caution';
import { formatFigure, roundUpTo } from '../../units/figure-format';

const FIELDS: FindingFields = {
  checkId: 'fuel.injector-size',
  group: 'fuel',
  title: 'Injector size for the target power',
  unit: 'lb/h',
  limit: 'min',
  thresholdSource:
    'Published EFI sizing: injector flow = HP × BSFC / (cylinders × maximum duty), BSFC 0.50 lb/hp·h; flow scales with √(pressure); 80 % maximum duty (common practice).',
};

export function checkInjectorSize({ spec, settings }: CheckContext): Finding {
  const engine = spec.engine;
  const missing = [
    ...(engine.injectorFlowLbh === undefined ? ['engine.injectorFlowLbh'] : []),
    ...(engine.injectorRatedPsi === undefined ? ['engine.injectorRatedPsi'] : []),
  ];
  if (engine.injectorFlowLbh === undefined || engine.injectorRatedPsi === undefined) return unknownFinding(FIELDS, missing);
  const powerHp = kwToHp(spec.goals.targetPowerKw);
  const required = requiredInjectorFlowLbh(powerHp, settings.bsfcLbPerHpH, engine.cylinders, settings.injectorMaxDuty);
  const operatingPsi = engine.fuelPressurePsi;
  const measured = injectorFlowAtPressure(engine.injectorFlowLbh, engine.injectorRatedPsi, operatingPsi);
  const margin = measured - required;
  const status = statusFromMargin(margin, settings.fuelTightBandFraction * required);
  const sg = settings.fuelSpecificGravity;
  // The requirement is rounded up once, to the same 0.1 lb/h the part remedy asks for, and printed that way everywhere.
  const requiredShown = roundUpTo(required, 1);
  const flow = (lbh: number): string => `${formatFigure(lbh, 'lb/h')} (${formatFigure(lbhToCcPerMin(lbh, sg), 'cc/min', { decimals: 0 })})`;
  const psi = formatFigure(operatingPsi, 'psi');
  const message = `At ${formatFigure(spec.goals.targetPowerKw, 'kW', { decimals: 0 })} (${formatFigure(powerHp, 'hp', { decimals: 0 })}) each of ${engine.cylinders} injectors must flow at least ${flow(requiredShown)} at ${Math.round(settings.injectorMaxDuty * 100)} % duty; the engine's injectors give ${flow(measured)} at ${psi}.`;
  return measuredFinding({ ...FIELDS, against: engine.id }, { measured, required, margin, status }, message, [
    {
      kind: 'part',
      category: 'injector',
      requires: { minFlowLbh: requiredShown, atPsi: operatingPsi, count: engine.cylinders },
      partIds: [],
      note: `Injectors of at least ${formatFigure(requiredShown, 'lb/h')} at ${psi}; the controller's injector data must be updated to match. ${FUEL_SYSTEM_CAUTION}`,
    },
  ]);
}

export const INJECTOR_SIZE_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkInjectorSize,
};
