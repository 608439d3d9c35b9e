import { fuelMassFlowLbhFromKw, requiredPumpFlowLph } from '../../fuel/fuel-flow';
import type { Finding, Remedy } from '../../types/finding';
import type { FitSpec } from '../../types/fit-spec';
import { describeMissingInput, measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { FUEL_SYSTEM_CAUTION } from './fuel-caution';
import { formatFigure } from '../../units/figure-format';
import { describeChassisPump, enterFuelFigures, givenFigure, missingFuelFigures } from './fuel-system-figures';

/** The pump flow the engine needs, as every message and note prints it (rounded up to 0.1 L/h). */
export function formatRequiredFlow(lph: number): string {
  return formatFigure(lph, 'L/h', { roundUp: true });
}

const FIELDS: FindingFields = {
  checkId: 'fuel.pump-flow',
  group: 'fuel',
  title: 'Fuel pump flow for the target power',
  unit: 'L/h',
  limit: 'min',
  thresholdSource:
    'Fuel mass flow = HP × BSFC (published EFI sizing); volume flow from gasoline density 6.0 lb/gal (US DOE Alternative Fuels Data Center); 20–30 % pump margin (common practice).',
};

/** The pump, regulator and safety advice to feed an injected engine. */
export function efiFuelSupplyRemedies(spec: FitSpec, minFlowLph: number): Remedy[] {
  const psi = spec.engine.fuelPressurePsi;
  return [
    {
      kind: 'part',
      category: 'fuel-pump',
      requires: { minFlowLph: Math.ceil(minFlowLph), minPressurePsi: psi },
      partIds: [],
      note: `An in-tank or inline pump that delivers at least ${formatRequiredFlow(minFlowLph)} at ${formatFigure(psi, 'psi')}, with hose and filter rated for injection pressure. ${FUEL_SYSTEM_CAUTION}`,
    },
    {
      kind: 'part',
      category: 'fuel-regulator',
      requires: { pressurePsi: psi },
      partIds: [],
      note: `A regulator set to ${formatFigure(psi, 'psi')} (return or returnless, to suit the tank). ${FUEL_SYSTEM_CAUTION}`,
    },
  ];
}

export function checkFuelPumpFlow({ spec, settings }: CheckContext): Finding {
  const system = spec.chassis.fuelSystem;
  const massFlow = fuelMassFlowLbhFromKw(spec.goals.targetPowerKw, settings.bsfcLbPerHpH);
  const required = requiredPumpFlowLph(massFlow, settings.fuelDensityLbPerGal, settings.fuelPumpMargin);
  const needPsi = spec.engine.fuelPressurePsi;
  const remedies = efiFuelSupplyRemedies(spec, required);
  const need = `The engine burns ${formatFigure(massFlow, 'lb/h')} of fuel at ${formatFigure(spec.goals.targetPowerKw, 'kW', { decimals: 0 })}, so the pump must deliver at least ${formatRequiredFlow(required)} at ${formatFigure(needPsi, 'psi')} (${Math.round(settings.fuelPumpMargin * 100)} % margin)`;
  // A pump that cannot reach injection pressure delivers no usable flow there: the check fails without a "found"
  // figure (null, never a made-up 0 L/h); the sentence gives the pump's own figures as entered.
  if (system.kind === 'carburetor') {
    return measuredFinding(
      FIELDS,
      { measured: null, required, margin: null, status: 'fails' },
      `${need}; the chassis has a carburetor fuel system whose low-pressure pump (${describeChassisPump(system)}) cannot feed injection.`,
      remedies,
    );
  }
  const missing = missingFuelFigures(system, ['pumpFlowLph', 'pumpRatedPsi']);
  if (missing.length > 0) {
    return unknownFinding(
      FIELDS,
      missing,
      `Cannot check the fuel pump flow: ${missing.map(describeMissingInput).join(' and ')} ${missing.length === 1 ? 'is' : 'are'} not given. ${need}; ${enterFuelFigures(missing.length)}.`,
    );
  }
  const pumpFlow = givenFigure(system.pumpFlowLph)!;
  const pumpPsi = givenFigure(system.pumpRatedPsi)!;
  if (pumpPsi < needPsi) {
    return measuredFinding(
      FIELDS,
      { measured: null, required, margin: null, status: 'fails' },
      `${need}; the chassis pump is rated at only ${formatFigure(pumpPsi, 'psi')}, so its ${formatFigure(pumpFlow, 'L/h')} is not available at ${formatFigure(needPsi, 'psi')}.`,
      remedies,
    );
  }
  const margin = pumpFlow - required;
  const status = statusFromMargin(margin, settings.fuelTightBandFraction * required);
  return measuredFinding(
    FIELDS,
    { measured: pumpFlow, required, margin, status },
    `${need}; the chassis pump gives ${formatFigure(pumpFlow, 'L/h')} at ${formatFigure(pumpPsi, 'psi')}.`,
    remedies.slice(0, 1),
  );
}

export const FUEL_PUMP_FLOW_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkFuelPumpFlow,
};
