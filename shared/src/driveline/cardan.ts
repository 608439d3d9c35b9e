import { degToRad } from '../units/angle';

/**
 * Single Cardan joint at operating angle β. Source: standard theory-of-machines texts (Hooke's joint):
 * ω₂/ω₁ = cos β / (1 − sin²β·cos²θ), θ the input shaft's rotation from the position where the input yoke lies in
 * the plane of the two shafts.
 */
export function cardanSpeedRatio(operatingAngleDeg: number, inputRotationDeg: number): number {
  const beta = degToRad(operatingAngleDeg);
  const theta = degToRad(inputRotationDeg);
  const sinBeta = Math.sin(beta);
  const cosTheta = Math.cos(theta);
  return Math.cos(beta) / (1 - sinBeta * sinBeta * cosTheta * cosTheta);
}

/** Largest output/input speed ratio over a turn, 1/cos β (at θ = 0°). */
export function cardanMaxSpeedRatio(operatingAngleDeg: number): number {
  return 1 / Math.cos(degToRad(operatingAngleDeg));
}

/** Smallest output/input speed ratio over a turn, cos β (at θ = 90°). */
export function cardanMinSpeedRatio(operatingAngleDeg: number): number {
  return Math.cos(degToRad(operatingAngleDeg));
}

/** Peak-to-peak speed fluctuation as a fraction of input speed: 1/cos β − cos β = tan β·sin β. */
export function cardanSpeedFluctuation(operatingAngleDeg: number): number {
  const beta = degToRad(operatingAngleDeg);
  return Math.tan(beta) * Math.sin(beta);
}

/** Output speed range over one turn for a steady input speed. */
export function cardanOutputSpeedRange(inputRpm: number, operatingAngleDeg: number): { minRpm: number; maxRpm: number } {
  return { minRpm: inputRpm * cardanMinSpeedRatio(operatingAngleDeg), maxRpm: inputRpm * cardanMaxSpeedRatio(operatingAngleDeg) };
}
