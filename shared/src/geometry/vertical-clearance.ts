import type { ChassisPoint } from '../types/fit-spec';

export interface VerticalClearance {
  /** Smallest (upper z − lower z) over the x range both polylines cover; negative when `lower` pokes through. */
  clearance: number;
  /** The point of the lower polyline (shifted by dz) and the point of the upper one where it is smallest. */
  from: ChassisPoint;
  to: ChassisPoint;
}

/** z of a polyline at x, or NaN outside its x range; the highest z when several segments span x. */
export function polylineZAt(line: readonly ChassisPoint[], x: number, pick: 'max' | 'min' = 'max'): number {
  let z = NaN;
  for (let i = 0; i + 1 < line.length; i++) {
    const p = line[i];
    const q = line[i + 1];
    const lo = Math.min(p.x, q.x);
    const hi = Math.max(p.x, q.x);
    if (x < lo - 1e-9 || x > hi + 1e-9) continue;
    const zi = q.x === p.x ? (pick === 'max' ? Math.max(p.z, q.z) : Math.min(p.z, q.z)) : p.z + ((x - p.x) * (q.z - p.z)) / (q.x - p.x);
    if (Number.isNaN(z) || (pick === 'max' ? zi > z : zi < z)) z = zi;
  }
  if (Number.isNaN(z) && line.length === 1 && Math.abs(line[0].x - x) < 1e-9) z = line[0].z;
  return z;
}

/**
 * Vertical clearance from a polyline below (e.g. the placed top profile of the engine) to a polyline above
 * (the underside of the hood), over the x range both cover. Both are piecewise linear, so their difference
 * is smallest at a vertex of one of them: those are the only places evaluated. Null when they share no x.
 */
export function verticalClearance(
  lower: readonly ChassisPoint[],
  upper: readonly ChassisPoint[],
  lowerDz = 0,
): VerticalClearance | null {
  let best: VerticalClearance | null = null;
  const consider = (x: number, zLow: number, zUp: number): void => {
    if (Number.isNaN(zLow) || Number.isNaN(zUp)) return;
    const c = zUp - zLow;
    if (best === null || c < best.clearance) best = { clearance: c, from: { x, z: zLow }, to: { x, z: zUp } };
  };
  for (const p of lower) consider(p.x, p.z + lowerDz, polylineZAt(upper, p.x, 'min'));
  for (const q of upper) {
    const zl = polylineZAt(lower, q.x, 'max');
    consider(q.x, zl + lowerDz, q.z);
  }
  return best;
}
