/**
 * Heat the cooling system must reject. Common practice (no published source): heat to coolant about equal to brake
 * power at full throttle, and the radiator sized for continuous power, not peak. Derived: coolant flow Q = ṁ·cp·ΔT.
 */
export function heatToCoolantKw(powerKw: number, heatToCoolantFraction: number): number {
  return powerKw * heatToCoolantFraction;
}

/** Radiator rating less the margin kept in hand: rated × (1 − margin). */
export function usableRadiatorKw(ratedKw: number, coolingMargin: number): number {
  return ratedKw * (1 - coolingMargin);
}

/** Rating a radiator needs so that its usable capacity covers the heat. */
export function requiredRadiatorRatingKw(heatKw: number, coolingMargin: number): number {
  return heatKw / (1 - coolingMargin);
}

/** Coolant mass flow, kg/s, to carry `heatKw` with a temperature drop `deltaTK` across the radiator. */
export function coolantMassFlowKgPerS(heatKw: number, specificHeatKjPerKgK: number, deltaTK: number): number {
  return heatKw / (specificHeatKjPerKgK * deltaTK);
}
