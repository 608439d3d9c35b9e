import { Point, Polygon, Segment } from '@flatten-js/core';
import type { ChassisPoint } from '../types/fit-spec';

/**
 * Separation distance and the shortest segment between an outline and a polygon, computed with
 * @flatten-js/core (not on the hot path: the side-view drawing uses it for its dimension lines, and the
 * tests compare it with the hand path). Returns 0 when the outlines touch or overlap.
 */
export function flattenDistance(
  a: readonly ChassisPoint[],
  aClosed: boolean,
  b: readonly ChassisPoint[],
): { distance: number; from: ChassisPoint; to: ChassisPoint } {
  const pb = new Polygon(b.map((p) => [p.x, p.z] as [number, number]));
  if (aClosed && a.length >= 3) {
    const pa = new Polygon(a.map((p) => [p.x, p.z] as [number, number]));
    const [distance, seg] = pa.distanceTo(pb);
    return { distance, from: { x: seg.ps.x, z: seg.ps.y }, to: { x: seg.pe.x, z: seg.pe.y } };
  }
  let best = { distance: Infinity, from: { x: 0, z: 0 }, to: { x: 0, z: 0 } };
  const parts: Array<Segment | Point> =
    a.length === 1 ? [new Point(a[0].x, a[0].z)] : a.slice(1).map((p, i) => new Segment(new Point(a[i].x, a[i].z), new Point(p.x, p.z)));
  for (const part of parts) {
    const [distance, seg] = part.distanceTo(pb);
    if (distance < best.distance) best = { distance, from: { x: seg.ps.x, z: seg.ps.y }, to: { x: seg.pe.x, z: seg.pe.y } };
  }
  return best;
}
