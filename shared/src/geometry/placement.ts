import type { ChassisPoint, EnginePoint, Placement } from '../types/fit-spec';

const DEG = Math.PI / 180;

/** x = x_e − u·cosθ + w·sinθ, z = z_e + u·sinθ + w·cosθ (θ positive: front higher than rear). */
export function placeEnginePoint(point: EnginePoint, placement: Placement): ChassisPoint {
  const cos = Math.cos(placement.tiltDeg * DEG);
  const sin = Math.sin(placement.tiltDeg * DEG);
  return {
    x: placement.setbackMm - point.u * cos + point.w * sin,
    z: placement.heightMm + point.u * sin + point.w * cos,
  };
}

export function placeEngineOutline(points: readonly EnginePoint[], placement: Placement): ChassisPoint[] {
  return points.map((point) => placeEnginePoint(point, placement));
}
