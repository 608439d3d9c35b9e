import { fuelMassFlowLbhFromKw, requiredPumpFlowLph } from '../../fuel/fuel-flow';
import type { Finding } from '../../types/finding';
import { describeMissingInput, measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { FUEL_SYSTEM_CAUTION } from './fuel-caution';
import { efiFuelSupplyRemedies } from './fuel-pump-flow';
import { formatFigure } from '../../units/figure-format';
import { carburetorSystemPsi, describeChassisPump, enterFuelFigures, givenFigure, missingFuelFigures } from './fuel-system-figures';

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
    // The pressure a carburetor system runs at, as given (its regulator, else the pump's rating); never a made-up 0 psi.
    const psi = carburetorSystemPsi(system);
    const regulator = givenFigure(system.regulatorPsi) === null ? 'no regulator' : `regulator at ${formatFigure(system.regulatorPsi, 'psi')}`;
    return measuredFinding(
      FIELDS,
      { measured: psi, required, margin: psi === null ? null : -Math.abs(required - psi), status: 'fails' },
      `The chassis has a carburetor fuel system (pump ${describeChassisPump(system)}, ${regulator}); the engine's injection needs ${formatFigure(required, 'psi')}, so the system needs an injection pump and regulator.`,
      efiFuelSupplyRemedies(spec, minFlow),
    );
  }
  const missing = missingFuelFigures(system, ['regulatorPsi']);
  if (missing.length > 0) {
    return unknownFinding(
      FIELDS,
      missing,
      `Cannot check the fuel system pressure: ${missing.map(describeMissingInput).join(' and ')} is not given. The engine is rated at ${formatFigure(required, 'psi')}; ${enterFuelFigures(missing.length)}.`,
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
