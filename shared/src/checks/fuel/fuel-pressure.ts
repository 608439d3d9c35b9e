import { fuelMassFlowLbhFromKw, requiredPumpFlowLph } from '../../fuel/fuel-flow';
import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { FUEL_SYSTEM_CAUTION } from './fuel-caution';
import { efiFuelSupplyRemedies } from './fuel-pump-flow';
import { formatFigure } from '../../units/figure-format';

const FIELDS: FindingFields = {
  checkId: 'fuel.system-pressure',
  group: 'fuel',
  title: 'Fuel system pressure',
  unit: 'psi',
  limit: 'match',
  thresholdSource: "The engine's rated fuel pressure; the regulator within a few psi of it (common practice, no published source).",
};

export function checkFuelSystemPressure({ spec, settings }: CheckContext): Finding {
  const system = spec.chassis.fuelSystem;
  const required = spec.engine.fuelPressurePsi;
  const minFlow = requiredPumpFlowLph(
    fuelMassFlowLbhFromKw(spec.goals.targetPowerKw, settings.bsfcLbPerHpH),
    settings.fuelDensityLbPerGal,
    settings.fuelPumpMargin,
  );
  if (system.kind === 'carburetor') {
    return measuredFinding(
      FIELDS,
      { measured: system.regulatorPsi, required, margin: -Math.abs(required - system.regulatorPsi), status: 'fails' },
      `The chassis has a carburetor fuel system at ${formatFigure(system.regulatorPsi, 'psi')}; the engine's injection needs ${formatFigure(required, 'psi')}, so the system needs an injection pump and regulator.`,
      efiFuelSupplyRemedies(spec, minFlow),
    );
  }
  const difference = system.regulatorPsi - required;
  const margin = settings.fuelPressureTolerancePsi - Math.abs(difference);
  const status = difference === 0 ? 'ok' : statusFromMargin(margin, settings.fuelPressureTolerancePsi);
  return measuredFinding(
    FIELDS,
    { measured: system.regulatorPsi, required, margin, status },
    `The chassis regulator holds ${formatFigure(system.regulatorPsi, 'psi')}; the engine is rated at ${formatFigure(required, 'psi')} (${formatFigure(difference, 'psi', { signed: true })}).`,
    [
      {
        kind: 'part',
        category: 'fuel-regulator',
        requires: { pressurePsi: required },
        partIds: [],
        note: `Set or replace the regulator for ${formatFigure(required, 'psi')} and check it with a gauge. ${FUEL_SYSTEM_CAUTION}`,
      },
    ],
  );
}

export const FUEL_SYSTEM_PRESSURE_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkFuelSystemPressure,
};
