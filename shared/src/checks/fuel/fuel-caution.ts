/** Shown wherever a remedy touches the fuel system. */
export const FUEL_SYSTEM_CAUTION =
  'Fuel system work is a fire risk: relieve the pressure first, work in a ventilated space away from sparks and flame with an extinguisher at hand, use hose, fittings and clamps rated for injection pressure, and follow local codes, emissions rules and licensed practice.';
