import type { ChassisPoint } from '@swapwright/shared';

export type Pt = ChassisPoint;

export type Bounds = { xMin: number; xMax: number; zMin: number; zMax: number };

export function boundsOf(groups: ReadonlyArray<readonly Pt[]>): Bounds {
  const b: Bounds = { xMin: Infinity, xMax: -Infinity, zMin: Infinity, zMax: -Infinity };
  for (const pts of groups)
    for (const p of pts) {
      if (!Number.isFinite(p.x) || !Number.isFinite(p.z)) continue;
      b.xMin = Math.min(b.xMin, p.x);
      b.xMax = Math.max(b.xMax, p.x);
      b.zMin = Math.min(b.zMin, p.z);
      b.zMax = Math.max(b.zMax, p.z);
    }
  if (!Number.isFinite(b.xMin)) return { xMin: 0, xMax: 1000, zMin: 0, zMax: 1000 };
  return b;
}

function closestOnSegment(p: Pt, a: Pt, b: Pt): Pt {
  const dx = b.x - a.x;
  const dz = b.z - a.z;
  const len2 = dx * dx + dz * dz;
  const t = len2 > 0 ? Math.min(1, Math.max(0, ((p.x - a.x) * dx + (p.z - a.z) * dz) / len2)) : 0;
  return { x: a.x + t * dx, z: a.z + t * dz };
}

function segmentsOf(points: readonly Pt[], closed: boolean): Array<[Pt, Pt]> {
  const out: Array<[Pt, Pt]> = [];
  for (let i = 0; i + 1 < points.length; i++) out.push([points[i], points[i + 1]]);
  if (closed && points.length > 2) out.push([points[points.length - 1], points[0]]);
  if (points.length === 1) out.push([points[0], points[0]]);
  return out;
}

const dist2 = (a: Pt, b: Pt) => (a.x - b.x) ** 2 + (a.z - b.z) ** 2;

/** The pair of points (one on each outline) that are nearest each other: where a clearance is dimensioned. */
export function nearestPoints(a: readonly Pt[], aClosed: boolean, b: readonly Pt[], bClosed: boolean): { from: Pt; to: Pt } | null {
  if (a.length === 0 || b.length === 0) return null;
  const sa = segmentsOf(a, aClosed);
  const sb = segmentsOf(b, bClosed);
  let best: { from: Pt; to: Pt; d: number } | null = null;
  const consider = (from: Pt, to: Pt) => {
    const d = dist2(from, to);
    if (!best || d < best.d) best = { from, to, d };
  };
  for (const [p1, p2] of sa)
    for (const [q1, q2] of sb) {
      consider(p1, closestOnSegment(p1, q1, q2));
      consider(p2, closestOnSegment(p2, q1, q2));
      consider(closestOnSegment(q1, p1, p2), q1);
      consider(closestOnSegment(q2, p1, p2), q2);
    }
  const found = best as { from: Pt; to: Pt; d: number } | null;
  return found ? { from: found.from, to: found.to } : null;
}

/** Is p inside the closed polygon? (even-odd rule) */
export function insidePolygon(p: Pt, polygon: readonly Pt[]): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[i];
    const b = polygon[j];
    if (a.z > p.z !== b.z > p.z && p.x < ((b.x - a.x) * (p.z - a.z)) / (b.z - a.z) + a.x) inside = !inside;
  }
  return inside;
}

/** z of a polyline (sorted or not by x) at x, by linear interpolation; null outside its span. */
export function zAt(line: readonly Pt[], x: number): number | null {
  for (let i = 0; i + 1 < line.length; i++) {
    const a = line[i];
    const b = line[i + 1];
    const lo = Math.min(a.x, b.x);
    const hi = Math.max(a.x, b.x);
    if (x >= lo && x <= hi) {
      if (hi === lo) return Math.min(a.z, b.z);
      return a.z + ((x - a.x) / (b.x - a.x)) * (b.z - a.z);
    }
  }
  return null;
}
