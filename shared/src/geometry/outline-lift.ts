import type { ChassisPoint } from '../types/fit-spec';
import { edgeCount, outlinesOverlap } from './outline-overlap';

/** The smallest vertical lift of an engine outline that separates it from an obstacle it overlaps. */
interface LiftEvent {
  t: number;
  fx: number;
  fz: number;
  tx: number;
  tz: number;
}

/** z of segment r–s at x (the segment spans x); both ends when the segment is vertical. */
function pushVerticalEvents(
  px: number,
  pz: number,
  r: ChassisPoint,
  s: ChassisPoint,
  rDz: number,
  sign: 1 | -1,
  events: LiftEvent[],
  pointIsOnA: boolean,
): void {
  const lo = Math.min(r.x, s.x);
  const hi = Math.max(r.x, s.x);
  if (px < lo - 1e-9 || px > hi + 1e-9) return;
  const zs: number[] = [];
  if (Math.abs(s.x - r.x) < 1e-12) {
    zs.push(r.z + rDz, s.z + rDz);
  } else {
    zs.push(r.z + rDz + ((px - r.x) * (s.z - r.z)) / (s.x - r.x));
  }
  for (const ez of zs) {
    // sign +1: a's point p rises to meet b's edge (t = edge − p); −1: b's point meets a's rising edge (t = p − edge).
    const t = sign * (ez - pz);
    if (t > 0) {
      if (pointIsOnA) events.push({ t, fx: px, fz: pz, tx: px, tz: ez });
      else events.push({ t, fx: px, fz: ez, tx: px, tz: pz });
    }
  }
}

/** True when every vertical line meets the outline in one interval (a point for a line): x goes one way, then back. */
export function isVerticallyConvex(points: readonly ChassisPoint[], closed: boolean): boolean {
  const n = points.length;
  if (n < 2) return true;
  let changes = 0;
  let lastSign = 0;
  const edges = closed ? n : n - 1;
  for (let i = 0; i < edges; i++) {
    const dx = points[(i + 1) % n].x - points[i].x;
    if (Math.abs(dx) < 1e-12) continue;
    const sign = dx > 0 ? 1 : -1;
    if (lastSign !== 0 && sign !== lastSign) changes++;
    lastSign = sign;
  }
  if (!closed) return changes === 0;
  // Closing the cycle: compare the last direction with the first.
  let firstSign = 0;
  for (let i = 0; i < edges && firstSign === 0; i++) {
    const dx = points[(i + 1) % n].x - points[i].x;
    if (Math.abs(dx) >= 1e-12) firstSign = dx > 0 ? 1 : -1;
  }
  if (firstSign !== 0 && lastSign !== 0 && firstSign !== lastSign) changes++;
  return changes <= 2;
}

/** Lowest (pick −1) or highest (+1) z of the outline's edges at x, or NaN when no edge spans x. */
function envelopeAt(points: readonly ChassisPoint[], closed: boolean, x: number, dz: number, pick: 1 | -1): number {
  const n = points.length;
  const edges = closed ? n : n - 1;
  let best = NaN;
  for (let i = 0; i < edges; i++) {
    const p = points[i];
    const q = points[(i + 1) % n];
    const lo = p.x < q.x ? p.x : q.x;
    const hi = p.x < q.x ? q.x : p.x;
    if (x < lo - 1e-9 || x > hi + 1e-9) continue;
    let z: number;
    if (hi - lo < 1e-12) z = pick === 1 ? Math.max(p.z, q.z) : Math.min(p.z, q.z);
    else z = p.z + ((x - p.x) * (q.z - p.z)) / (q.x - p.x);
    z += dz;
    if (Number.isNaN(best) || (pick === 1 ? z > best : z < best)) best = z;
  }
  if (Number.isNaN(best) && n === 1 && Math.abs(points[0].x - x) < 1e-9) best = points[0].z + dz;
  return best;
}

/**
 * Closed form for vertically convex outlines whose interiors overlap (callers check that first): lifting
 * `a` clears `b` only by passing over it at every x
 * they share (a section cannot switch from above to below along a connected x range), so the lift is the
 * largest (top of b − bottom of a) over the shared x range, taken at the vertices of either outline.
 * Returns null when either outline is not vertically convex.
 */
export function verticalLiftConvex(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
  dz = 0,
): { lift: number; from: ChassisPoint; to: ChassisPoint } | null {
  if (!isVerticallyConvex(a, aClosed) || !isVerticallyConvex(b, true)) return null;
  let aMin = Infinity;
  let aMax = -Infinity;
  for (const p of a) {
    if (p.x < aMin) aMin = p.x;
    if (p.x > aMax) aMax = p.x;
  }
  let bMin = Infinity;
  let bMax = -Infinity;
  for (const q of b) {
    if (q.x < bMin) bMin = q.x;
    if (q.x > bMax) bMax = q.x;
  }
  const lo = Math.max(aMin, bMin);
  const hi = Math.min(aMax, bMax);
  const none = { lift: 0, from: { x: lo, z: 0 }, to: { x: lo, z: 0 } };
  if (hi - lo <= 1e-9) return none;
  let best = -Infinity;
  let bestX = lo;
  let bestA = 0;
  let bestB = 0;
  const visit = (x: number): void => {
    if (x < lo || x > hi) return;
    const za = envelopeAt(a, aClosed, x, dz, -1);
    const zb = envelopeAt(b, true, x, 0, 1);
    if (Number.isNaN(za) || Number.isNaN(zb)) return;
    if (zb - za > best) {
      best = zb - za;
      bestX = x;
      bestA = za;
      bestB = zb;
    }
  };
  visit(lo);
  visit(hi);
  for (const p of a) visit(p.x);
  for (const q of b) visit(q.x);
  if (!(best > 0)) return none;
  return { lift: best, from: { x: bestX, z: bestA }, to: { x: bestX, z: bestB } };
}

/**
 * Smallest upward shift t ≥ 0 of `a` (already shifted by dz) after which the interiors no longer overlap.
 * Exact for polygons: the overlap state only changes at lifts where a vertex of one outline is vertically
 * in line with an edge of the other, so each open interval between those lifts is tested once at its middle.
 */
export function verticalSeparationLift(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
  dz = 0,
): { lift: number; from: ChassisPoint; to: ChassisPoint } {
  const events: LiftEvent[] = [];
  const na = a.length;
  const nb = b.length;
  const ea = edgeCount(a, aClosed);
  for (let i = 0; i < na; i++) {
    for (let j = 0; j < nb; j++) pushVerticalEvents(a[i].x, a[i].z + dz, b[j], b[(j + 1) % nb], 0, 1, events, true);
  }
  for (let j = 0; j < nb; j++) {
    for (let i = 0; i < ea; i++) pushVerticalEvents(b[j].x, b[j].z, a[i], a[(i + 1) % na], dz, -1, events, false);
  }
  let minA = Infinity;
  let minAx = 0;
  for (const p of a) {
    if (p.z + dz < minA) {
      minA = p.z + dz;
      minAx = p.x;
    }
  }
  let maxB = -Infinity;
  for (const q of b) maxB = Math.max(maxB, q.z);
  const tAbove = Math.max(0, maxB - minA);
  // Past tAbove the whole of `a` is above the whole of `b`: always separated.
  events.push({ t: tAbove, fx: minAx, fz: minA, tx: minAx, tz: maxB });
  events.sort((e1, e2) => e1.t - e2.t);
  let prevT = 0;
  let prevEvent: LiftEvent | null = null;
  for (const e of events) {
    if (e.t > tAbove + 1e-9) break;
    if (e.t - prevT <= 1e-9) {
      if (prevEvent === null && prevT > 0) prevEvent = e;
      continue;
    }
    if (!outlinesOverlap(a, aClosed, b, dz + (prevT + e.t) / 2)) break;
    prevT = e.t;
    prevEvent = e;
  }
  if (prevEvent === null) return { lift: 0, from: { x: minAx, z: minA }, to: { x: minAx, z: minA } };
  return { lift: prevT, from: { x: prevEvent.fx, z: prevEvent.fz }, to: { x: prevEvent.tx, z: prevEvent.tz } };
}

