import type { ChassisPoint } from '../types/fit-spec';

/**
 * Gap along x from a set of points to a vertical plane x = planeX that lies ahead of them (smaller x):
 * min over the points of (x − planeX). Negative when a point is past the plane.
 */
export function xGapBehindPlane(points: readonly ChassisPoint[], planeX: number): { gap: number; point: ChassisPoint } | null {
  let best: { gap: number; point: ChassisPoint } | null = null;
  for (const p of points) {
    const g = p.x - planeX;
    if (best === null || g < best.gap) best = { gap: g, point: p };
  }
  return best;
}

/** Gap along x from points to a vertical plane x = planeX behind them (larger x): min of (planeX − x). */
export function xGapAheadOfPlane(points: readonly ChassisPoint[], planeX: number): { gap: number; point: ChassisPoint } | null {
  let best: { gap: number; point: ChassisPoint } | null = null;
  for (const p of points) {
    const g = planeX - p.x;
    if (best === null || g < best.gap) best = { gap: g, point: p };
  }
  return best;
}
