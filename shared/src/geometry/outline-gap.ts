import type { ChassisPoint } from '../types/fit-spec';

/**
 * Outline-to-outline gap, the fast hand path used by every envelope check and the fit window.
 *
 * Definition of the gap: when the two outlines do not touch, the smallest distance between them;
 * when they overlap, the gap is negative and equals minus the smallest vertical lift of the engine outline
 * (`a`) that separates it from the obstacle (`b`). Touching outlines have a gap of 0.
 *
 * `a` may be a closed polygon or an open polyline; `b` is always a closed polygon. `dz` shifts `a` up
 * without copying it (the fit window evaluates one placed outline at many heights).
 * Cross-checked in tests against jsts DistanceOp and @flatten-js/core.
 */
export interface GapResult {
  gap: number;
  overlapping: boolean;
  /** Witness: the point on `a` (already shifted by dz) and the point on `b` that realise the gap. */
  from: ChassisPoint;
  to: ChassisPoint;
}

const EPS = 1e-9;

interface Best {
  d2: number;
  fx: number;
  fz: number;
  tx: number;
  tz: number;
}

/** Squared distance from p to segment s1–s2, updating `best` (from = on a, to = on b). */
function pointToSegment(
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

function orient(ax: number, az: number, bx: number, bz: number, cx: number, cz: number): number {
  return (bx - ax) * (cz - az) - (bz - az) * (cx - ax);
}

/** True when the open segments cross at a single interior point (not merely touching). */
function segmentsCrossProperly(
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

function edgeCount(points: readonly ChassisPoint[], closed: boolean): number {
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

// Reused by boundaryDistance (synchronous, never re-entered) so the hot path allocates nothing.
const SCRATCH: Best = { d2: Infinity, fx: 0, fz: 0, tx: 0, tz: 0 };

/** Smallest distance between the boundaries of `a` (shifted by dz) and `b`; also reports proper crossings. */
function boundaryDistance(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
  dz: number,
): { best: Best; crossing: boolean } {
  // (returns SCRATCH: callers read it before the next call)
  const best = SCRATCH;
  best.d2 = Infinity;
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
  if (ea === 0) return crossingResult(best, false);
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
  return crossingResult(best, crossing);
}

const RESULT = { best: SCRATCH, crossing: false };
function crossingResult(best: Best, crossing: boolean): { best: Best; crossing: boolean } {
  RESULT.best = best;
  RESULT.crossing = crossing;
  return RESULT;
}

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

/** The gap between engine outline `a` (shifted up by dz) and obstacle polygon `b`. */
export function outlineGap(a: readonly ChassisPoint[], aClosed: boolean, b: readonly ChassisPoint[], dz = 0): GapResult {
  const { best, crossing } = boundaryDistance(a, aClosed, b, dz);
  let touchingOrInside = crossing || best.d2 <= EPS;
  if (!touchingOrInside && a.length > 0) {
    touchingOrInside =
      pointStrictlyInPolygon(a[0].x, a[0].z + dz, b) || (aClosed && a.length >= 3 && pointStrictlyInPolygon(b[0].x, b[0].z, a, dz));
  }
  if (!touchingOrInside) {
    return {
      gap: Math.sqrt(best.d2),
      overlapping: false,
      from: { x: best.fx, z: best.fz },
      to: { x: best.tx, z: best.tz },
    };
  }
  // Touching (from any side) is a gap of 0; only a true overlap of the interiors is measured by a lift.
  if (!outlinesOverlap(a, aClosed, b, dz)) {
    return { gap: 0, overlapping: false, from: { x: best.fx, z: best.fz }, to: { x: best.tx, z: best.tz } };
  }
  const { lift, from, to } = verticalLiftConvex(a, aClosed, b, dz) ?? verticalSeparationLift(a, aClosed, b, dz);
  if (lift <= 0) {
    return { gap: 0, overlapping: false, from: { x: best.fx, z: best.fz }, to: { x: best.tx, z: best.tz } };
  }
  return { gap: -lift, overlapping: true, from, to };
}

/** Gap only, allocating nothing when the outlines are apart: the hot path of the fit window. */
export function outlineGapValue(a: readonly ChassisPoint[], aClosed: boolean, b: readonly ChassisPoint[], dz = 0): number {
  const { best, crossing } = boundaryDistance(a, aClosed, b, dz);
  if (!crossing && best.d2 > EPS && a.length > 0) {
    const inside =
      pointStrictlyInPolygon(a[0].x, a[0].z + dz, b) || (aClosed && a.length >= 3 && pointStrictlyInPolygon(b[0].x, b[0].z, a, dz));
    if (!inside) return Math.sqrt(best.d2);
  }
  return outlineGap(a, aClosed, b, dz).gap;
}

/** The way the engine would move to clear an obstacle; the gap below uses `up` (a vertical lift). */
export type SeparationDirection = 'up' | 'down' | 'forward' | 'rearward';

/**
 * The gap with the overlap measured along another direction: `down` for obstacles above the engine (the
 * transmission tunnel), `forward` for the firewall behind it. When the outlines do not touch it is the same
 * smallest distance as outlineGap. The direction is turned onto +z by a rotation or a mirror, which keeps
 * distances, and turned back for the witness points.
 */
export function outlineGapToward(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
  dz = 0,
  direction: SeparationDirection = 'up',
): GapResult {
  if (direction === 'up') return outlineGap(a, aClosed, b, dz);
  const to = (p: ChassisPoint, shift: number): ChassisPoint => {
    const z = p.z + shift;
    if (direction === 'down') return { x: p.x, z: -z };
    if (direction === 'forward') return { x: z, z: -p.x };
    return { x: -z, z: p.x };
  };
  const back = (p: ChassisPoint): ChassisPoint => {
    if (direction === 'down') return { x: p.x, z: -p.z };
    if (direction === 'forward') return { x: -p.z, z: p.x };
    return { x: p.z, z: -p.x };
  };
  const r = outlineGap(
    a.map((p) => to(p, dz)),
    aClosed,
    b.map((p) => to(p, 0)),
    0,
  );
  return { ...r, from: back(r.from), to: back(r.to) };
}
