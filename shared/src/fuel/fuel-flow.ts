import { KG_PER_LB, kwToHp, L_PER_US_GAL } from '../units/quantities';

/**
 * Fuel sizing for a target power. Sources: US DOE Alternative Fuels Data Center, "Fuel Properties Comparison"
 * (gasoline density and specific gravity); published EFI sizing notes (BSFC at maximum power, injector size =
 * HP × BSFC / (cylinders × max duty), flow scales with the square root of the pressure across the injector).
 */
export const CC_PER_LITER = 1000;
/** Density of water at 4 °C, the reference of specific gravity: 1 g/cc. */
const GRAMS_PER_CC_WATER = 1;

/** Fuel mass flow at full power, lb/h = hp × BSFC (lb/hp·h). */
export function fuelMassFlowLbh(powerHp: number, bsfcLbPerHpH: number): number {
  return powerHp * bsfcLbPerHpH;
}

export function fuelMassFlowLbhFromKw(powerKw: number, bsfcLbPerHpH: number): number {
  return fuelMassFlowLbh(kwToHp(powerKw), bsfcLbPerHpH);
}

/** Flow each injector must give at full power without passing the maximum duty cycle. */
export function requiredInjectorFlowLbh(powerHp: number, bsfcLbPerHpH: number, cylinders: number, maxDuty: number): number {
  if (!(cylinders > 0) || !(maxDuty > 0 && maxDuty <= 1)) throw new RangeError('Cylinders must be positive and the maximum duty in (0, 1].');
  return fuelMassFlowLbh(powerHp, bsfcLbPerHpH) / (cylinders * maxDuty);
}

/** lb/h → cc/min for a fuel of the given specific gravity: × 453.59237 g/lb / 60 min/h / SG g/cc. */
export function lbhToCcPerMin(lbh: number, specificGravity: number): number {
  return (lbh * KG_PER_LB * 1000) / 60 / (specificGravity * GRAMS_PER_CC_WATER);
}

export function ccPerMinToLbh(ccPerMin: number, specificGravity: number): number {
  return (ccPerMin * 60 * specificGravity * GRAMS_PER_CC_WATER) / (KG_PER_LB * 1000);
}

/** Injector flow at a new pressure: Q₂ = Q₁·√(P₂/P₁). Any flow unit; pressures in the same unit. */
export function injectorFlowAtPressure(ratedFlow: number, ratedPressure: number, newPressure: number): number {
  if (!(ratedPressure > 0) || !(newPressure >= 0)) throw new RangeError('Pressures must be positive.');
  return ratedFlow * Math.sqrt(newPressure / ratedPressure);
}

/** Volume flow a pump must give: mass flow / density × (1 + margin), US gal/h. */
export function requiredPumpFlowGph(massFlowLbh: number, densityLbPerGal: number, margin = 0): number {
  return (massFlowLbh / densityLbPerGal) * (1 + margin);
}

export function requiredPumpFlowLph(massFlowLbh: number, densityLbPerGal: number, margin = 0): number {
  return requiredPumpFlowGph(massFlowLbh, densityLbPerGal, margin) * L_PER_US_GAL;
}

/** Time for one engine cycle (two turns) in ms: 120000 / rpm; the injector may be open `maxDuty` of it. */
export function injectorCyclePeriodMs(engineRpm: number): number {
  return 120_000 / engineRpm;
}
