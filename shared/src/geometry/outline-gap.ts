import type { ChassisPoint } from '../types/fit-spec';
import { boundaryDistance } from './outline-distance';
import { outlinesOverlap, pointStrictlyInPolygon } from './outline-overlap';
import { verticalLiftConvex, verticalSeparationLift } from './outline-lift';
import { EPS } from './segment-primitives';

export { outlinesOverlap, pointStrictlyInPolygon } from './outline-overlap';
export { isVerticallyConvex, verticalLiftConvex, verticalSeparationLift } from './outline-lift';

/**
 * Outline-to-outline gap, the fast hand path used by every envelope check and the fit window. The pieces:
 * `outline-distance` (boundary distance), `outline-overlap` (do the interiors overlap) and `outline-lift` (the
 * vertical lift that separates an overlap); small segment predicates are in `segment-primitives`.
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
