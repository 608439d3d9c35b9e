import type { ChassisSpec } from '@swapwright/shared';

/**
 * Measured values that replace catalog values of a chassis for one project (from a measurement sheet).
 * The measurement module does not exist yet, so nothing provides overrides today; the spec builder already
 * passes every chassis through `applyChassisOverrides`, which is where measured values will land.
 */
export interface ChassisOverrides {
  /** Whole-field replacements of the catalog chassis spec, e.g. a re-measured crossmember outline. */
  fields: Partial<Omit<ChassisSpec, 'id' | 'name'>>;
  /** Where each replaced field came from, in words for the report's notes. */
  sources: string[];
}

export const NO_CHASSIS_OVERRIDES: ChassisOverrides = { fields: {}, sources: [] };

export function applyChassisOverrides(chassis: ChassisSpec, overrides: ChassisOverrides): ChassisSpec {
  return { ...chassis, ...overrides.fields, id: chassis.id, name: chassis.name };
}
