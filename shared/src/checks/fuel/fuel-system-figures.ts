import type { ChassisSpec } from '../../types/fit-spec';
import { formatFigure } from '../../units/figure-format';

type FuelSystem = ChassisSpec['fuelSystem'];

/**
 * The chassis fuel system's figures as given. A pump flow or pressure of zero (or none) is a figure nobody entered,
 * not a pump that delivers nothing: a check never prints it as "0.0 L/h" or "0.0 psi", it says it is not given
 * and what to enter. A carburetor system's regulator of zero means it has none (the pump sets the pressure).
 */
export function givenFigure(value: number | null | undefined): number | null {
  return typeof value === 'number' && Number.isFinite(value) && value > 0 ? value : null;
}

/** Field paths of the fuel system figures a check needs and nobody entered (for a finding's `missing`). */
export function missingFuelFigures(system: FuelSystem, fields: ReadonlyArray<'pumpFlowLph' | 'pumpRatedPsi' | 'regulatorPsi'>): string[] {
  return fields.filter((field) => givenFigure(system[field]) === null).map((field) => `chassis.fuelSystem.${field}`);
}

/** What to do about figures not given, for the sentence that asks for them. */
export function enterFuelFigures(count: number): string {
  return `enter ${count === 1 ? 'it' : 'them'} under the chassis model's fuel system (from the pump's label or data sheet, or a flow and pressure test)`;
}

/** The chassis pump as given: "120.0 L/h at 7.0 psi", "rated 7.0 psi, flow not given", "flow and pressure not given". */
export function describeChassisPump(system: FuelSystem): string {
  const flow = givenFigure(system.pumpFlowLph);
  const psi = givenFigure(system.pumpRatedPsi);
  if (flow !== null && psi !== null) return `${formatFigure(flow, 'L/h')} at ${formatFigure(psi, 'psi')}`;
  if (psi !== null) return `rated ${formatFigure(psi, 'psi')}, flow not given`;
  if (flow !== null) return `${formatFigure(flow, 'L/h')}, pressure not given`;
  return 'flow and pressure not given';
}

/** The pressure a carburetor system runs at: its regulator's when it has one, else the pump's rating; null when neither is given. */
export function carburetorSystemPsi(system: FuelSystem): number | null {
  return givenFigure(system.regulatorPsi) ?? givenFigure(system.pumpRatedPsi);
}
