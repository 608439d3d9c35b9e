import type { ChassisSpec } from '../types/fit-spec';

/**
 * Height of the ground under chassis station `x`: 0 at the catalog's ride height, else straight between the
 * measured ground under the front axle (x 0) and under the rear axle (x = wheelbase), extended beyond them.
 */
export function groundZAt(chassis: Pick<ChassisSpec, 'groundLine' | 'wheelbaseMm'>, x: number): number {
  const line = chassis.groundLine;
  if (!line || !(chassis.wheelbaseMm > 0)) return 0;
  return line.zAtFrontAxleMm + ((line.zAtRearAxleMm - line.zAtFrontAxleMm) * x) / chassis.wheelbaseMm;
}
