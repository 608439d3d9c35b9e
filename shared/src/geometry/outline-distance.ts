import type { ChassisPoint } from '../types/fit-spec';
import { edgeCount } from './outline-overlap';
import { EPS, pointToSegment, segmentsCrossProperly, type Best } from './segment-primitives';

/** The smallest distance between two outlines' boundaries (no state kept between calls). */
/** Smallest distance between the boundaries of `a` (shifted by dz) and `b`; also reports proper crossings. */
export function boundaryDistance(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
  dz: number,
): { best: Best; crossing: boolean } {
  const best: Best = { d2: Infinity, fx: 0, fz: 0, tx: 0, tz: 0 };
  const na = a.length;
  const nb = b.length;
  const ea = edgeCount(a, aClosed);
  let bx0 = Infinity;
  let bx1 = -Infinity;
  let bz0 = Infinity;
  let bz1 = -Infinity;
  for (let j = 0; j < nb; j++) {
    const q = b[j];
    if (q.x < bx0) bx0 = q.x;
    if (q.x > bx1) bx1 = q.x;
    if (q.z < bz0) bz0 = q.z;
    if (q.z > bz1) bz1 = q.z;
  }
  let ax0 = Infinity;
  let ax1 = -Infinity;
  let az0 = Infinity;
  let az1 = -Infinity;
  for (let i = 0; i < na; i++) {
    const p = a[i];
    if (p.x < ax0) ax0 = p.x;
    if (p.x > ax1) ax1 = p.x;
    if (p.z + dz < az0) az0 = p.z + dz;
    if (p.z + dz > az1) az1 = p.z + dz;
  }
  // a's vertices to b's edges; a vertex farther from b's bounding box than the best so far is skipped.
  for (let i = 0; i < na; i++) {
    const px = a[i].x;
    const pz = a[i].z + dz;
    const ex = px < bx0 ? bx0 - px : px > bx1 ? px - bx1 : 0;
    const ez = pz < bz0 ? bz0 - pz : pz > bz1 ? pz - bz1 : 0;
    if (ex * ex + ez * ez >= best.d2) continue;
    for (let j = 0; j < nb; j++) {
      const r = b[j];
      const s = b[(j + 1) % nb];
      pointToSegment(px, pz, r.x, r.z, s.x, s.z, best, true);
    }
  }
  // b's vertices to a's edges
  if (ea === 0) return { best, crossing: false };
  let crossing = false;
  for (let j = 0; j < nb; j++) {
    const qx = b[j].x;
    const qz = b[j].z;
    const ex = qx < ax0 ? ax0 - qx : qx > ax1 ? qx - ax1 : 0;
    const ez = qz < az0 ? az0 - qz : qz > az1 ? qz - az1 : 0;
    if (ex * ex + ez * ez >= best.d2) continue;
    for (let i = 0; i < ea; i++) {
      const p = a[i];
      const q = a[(i + 1) % na];
      pointToSegment(qx, qz, p.x, p.z + dz, q.x, q.z + dz, best, false);
    }
  }
  // Proper crossings are only possible where the bounding boxes overlap.
  if (best.d2 > EPS && ax0 <= bx1 && bx0 <= ax1 && az0 <= bz1 && bz0 <= az1) {
    outer: for (let i = 0; i < ea; i++) {
      const p = a[i];
      const q = a[(i + 1) % na];
      for (let j = 0; j < nb; j++) {
        const r = b[j];
        const s = b[(j + 1) % nb];
        if (segmentsCrossProperly(p.x, p.z + dz, q.x, q.z + dz, r.x, r.z, s.x, s.z)) {
          crossing = true;
          break outer;
        }
      }
    }
  }
  return { best, crossing };
}

