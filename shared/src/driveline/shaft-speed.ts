/**
 * Driveshaft speed at the planned top speed: wheel speed × axle ratio, wheel speed = road speed / tyre
 * circumference. Without road speed, tyre and axle figures: rev limit / top gear ratio (engine rpm through the
 * transmission's top gear).
 */
export interface ShaftSpeedInputs {
  topSpeedKph?: number;
  tireDiameterMm?: number;
  axleRatio?: number;
  revLimitRpm?: number;
  topGearRatio?: number;
}

export interface ShaftSpeed {
  rpm: number;
  basis: 'road-speed' | 'rev-limit';
}

export function shaftRpmFromRoadSpeed(topSpeedKph: number, tireDiameterMm: number, axleRatio: number): number {
  const mmPerMinute = (topSpeedKph * 1_000_000) / 60;
  return (mmPerMinute / (Math.PI * tireDiameterMm)) * axleRatio;
}

export function shaftRpmFromEngine(engineRpm: number, gearRatio: number): number {
  return engineRpm / gearRatio;
}

/** Null when neither set of figures is complete. */
export function driveshaftSpeed(inputs: ShaftSpeedInputs): ShaftSpeed | null {
  const { topSpeedKph, tireDiameterMm, axleRatio, revLimitRpm, topGearRatio } = inputs;
  if (isPositive(topSpeedKph) && isPositive(tireDiameterMm) && isPositive(axleRatio)) {
    return { rpm: shaftRpmFromRoadSpeed(topSpeedKph, tireDiameterMm, axleRatio), basis: 'road-speed' };
  }
  if (isPositive(revLimitRpm) && isPositive(topGearRatio)) {
    return { rpm: shaftRpmFromEngine(revLimitRpm, topGearRatio), basis: 'rev-limit' };
  }
  return null;
}

function isPositive(value: number | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value) && value > 0;
}
