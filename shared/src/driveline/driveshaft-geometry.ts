import { placeEnginePoint } from '../geometry/placement';
import type { ChassisPoint, Placement } from '../types/fit-spec';
import { radToDeg } from '../units/angle';

/**
 * The transmission's output U-joint centre in the chassis: on the crank line, behind the bell face by the
 * transmission's length to its output plus any bellhousing adapter between engine and transmission.
 */
export function transmissionOutputPoint(placement: Placement, lengthToOutputMm: number, adapterThicknessMm = 0): ChassisPoint {
  return placeEnginePoint({ u: -(lengthToOutputMm + adapterThicknessMm), w: 0 }, placement);
}

export interface DriveshaftLine {
  /** U-joint centre to U-joint centre, side view. */
  lengthMm: number;
  /** How far the pinion sits below the output (negative when above). */
  dropMm: number;
  /** Positive when the shaft falls toward the rear. */
  angleDeg: number;
}

export function driveshaftLine(output: ChassisPoint, pinion: ChassisPoint): DriveshaftLine {
  const run = pinion.x - output.x;
  const dropMm = output.z - pinion.z;
  const lengthMm = Math.hypot(run, dropMm);
  return { lengthMm, dropMm, angleDeg: radToDeg(Math.atan2(dropMm, run)) };
}

export interface SlipYokeInputs {
  /** The new shaft's length (centre to centre). */
  requiredLengthMm: number;
  /** How far the slip yoke can slide out from nominal engagement before it leaves the splines. */
  slipYokeTravelMm: number;
  /** An existing shaft to reuse; absent when a new shaft is cut to length. */
  existingLengthMm?: number;
  /** Growth of the output-to-pinion distance from ride height to full droop. */
  suspensionGrowthMm?: number;
}

export interface SlipYokeEngagement {
  /** How far the yoke is pulled out at ride height (negative: pushed further in). */
  pullOutAtRideMm: number;
  /** Spline engagement left at full droop, beyond the point where the yoke would leave the splines. */
  remainingMm: number;
}

export function slipYokeEngagement(inputs: SlipYokeInputs): SlipYokeEngagement {
  const pullOutAtRideMm = inputs.existingLengthMm === undefined ? 0 : inputs.requiredLengthMm - inputs.existingLengthMm;
  const remainingMm = inputs.slipYokeTravelMm - pullOutAtRideMm - (inputs.suspensionGrowthMm ?? 0);
  return { pullOutAtRideMm, remainingMm };
}
