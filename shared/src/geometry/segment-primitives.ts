
/** Small exact predicates and distances on segments, shared by the outline distance, overlap and lift. */
export const EPS = 1e-9;

export interface Best {
  d2: number;
  fx: number;
  fz: number;
  tx: number;
  tz: number;
}

/** Squared distance from p to segment s1–s2, updating `best` (from = on a, to = on b). */
export function pointToSegment(
  px: number,
  pz: number,
  x1: number,
  z1: number,
  x2: number,
  z2: number,
  best: Best,
  pointIsOnA: boolean,
): void {
  const dx = x2 - x1;
  const dz = z2 - z1;
  const len2 = dx * dx + dz * dz;
  let t = len2 > 0 ? ((px - x1) * dx + (pz - z1) * dz) / len2 : 0;
  if (t < 0) t = 0;
  else if (t > 1) t = 1;
  const qx = x1 + t * dx;
  const qz = z1 + t * dz;
  const ex = px - qx;
  const ez = pz - qz;
  const d2 = ex * ex + ez * ez;
  if (d2 < best.d2) {
    best.d2 = d2;
    if (pointIsOnA) {
      best.fx = px;
      best.fz = pz;
      best.tx = qx;
      best.tz = qz;
    } else {
      best.fx = qx;
      best.fz = qz;
      best.tx = px;
      best.tz = pz;
    }
  }
}

export function orient(ax: number, az: number, bx: number, bz: number, cx: number, cz: number): number {
  return (bx - ax) * (cz - az) - (bz - az) * (cx - ax);
}

/** True when the open segments cross at a single interior point (not merely touching). */
export function segmentsCrossProperly(
  ax: number, az: number, bx: number, bz: number,
  cx: number, cz: number, dx: number, dz: number,
): boolean {
  if (Math.max(ax, bx) < Math.min(cx, dx) || Math.max(cx, dx) < Math.min(ax, bx)) return false;
  if (Math.max(az, bz) < Math.min(cz, dz) || Math.max(cz, dz) < Math.min(az, bz)) return false;
  const scale = Math.max(1, Math.abs(bx - ax) + Math.abs(bz - az)) * Math.max(1, Math.abs(dx - cx) + Math.abs(dz - cz));
  const tol = 1e-12 * scale;
  const o1 = orient(ax, az, bx, bz, cx, cz);
  const o2 = orient(ax, az, bx, bz, dx, dz);
  const o3 = orient(cx, cz, dx, dz, ax, az);
  const o4 = orient(cx, cz, dx, dz, bx, bz);
  return ((o1 > tol && o2 < -tol) || (o1 < -tol && o2 > tol)) && ((o3 > tol && o4 < -tol) || (o3 < -tol && o4 > tol));
}

/** Crossing-number test; points within 1e-7 mm of the boundary count as outside ("strictly inside"). */
