import type { ChassisPoint } from '../types/fit-spec';
import { pointToSegment, segmentsCrossProperly, type Best } from './segment-primitives';

/** Whether an engine outline and an obstacle polygon overlap (interiors, not just touching). */
export function pointStrictlyInPolygon(px: number, pz: number, poly: readonly ChassisPoint[], polyDz = 0): boolean {
  let inside = false;
  const n = poly.length;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = poly[i].x;
    const zi = poly[i].z + polyDz;
    const xj = poly[j].x;
    const zj = poly[j].z + polyDz;
    if (zi > pz !== zj > pz && px < ((xj - xi) * (pz - zi)) / (zj - zi) + xi) inside = !inside;
  }
  if (!inside) return false;
  const best: Best = { d2: Infinity, fx: 0, fz: 0, tx: 0, tz: 0 };
  for (let i = 0, j = n - 1; i < n; j = i++) {
    pointToSegment(px, pz, poly[j].x, poly[j].z + polyDz, poly[i].x, poly[i].z + polyDz, best, true);
  }
  return best.d2 > 1e-14;
}

export function edgeCount(points: readonly ChassisPoint[], closed: boolean): number {
  if (points.length < 2) return 0;
  return closed ? points.length : points.length - 1;
}

/** Interiors overlap (touching does not count). `a` shifted up by dz. */
export function outlinesOverlap(a: readonly ChassisPoint[], aClosed: boolean, b: readonly ChassisPoint[], dz = 0): boolean {
  const na = a.length;
  const nb = b.length;
  const ea = edgeCount(a, aClosed);
  for (let i = 0; i < ea; i++) {
    const p = a[i];
    const q = a[(i + 1) % na];
    for (let j = 0; j < nb; j++) {
      const r = b[j];
      const s = b[(j + 1) % nb];
      if (segmentsCrossProperly(p.x, p.z + dz, q.x, q.z + dz, r.x, r.z, s.x, s.z)) return true;
    }
  }
  for (let i = 0; i < na; i++) {
    if (pointStrictlyInPolygon(a[i].x, a[i].z + dz, b)) return true;
  }
  for (let i = 0; i < ea; i++) {
    const p = a[i];
    const q = a[(i + 1) % na];
    if (pointStrictlyInPolygon((p.x + q.x) / 2, (p.z + q.z) / 2 + dz, b)) return true;
  }
  if (aClosed && na >= 3) {
    for (let j = 0; j < nb; j++) {
      if (pointStrictlyInPolygon(b[j].x, b[j].z, a, dz)) return true;
      const s = b[(j + 1) % nb];
      if (pointStrictlyInPolygon((b[j].x + s.x) / 2, (b[j].z + s.z) / 2, a, dz)) return true;
    }
  }
  return false;
}

