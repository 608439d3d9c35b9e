import type { ChassisObstacle, ChassisPoint, ChassisSpec, RailStation } from '../types/fit-spec';
import { interpolateStations } from '../geometry/interpolate';
import { isFloorHeight, MEASUREMENT_KIND_INFO, measurementUnit, type MeasurementPoint } from './measurement-points';

/** One measured value of a sheet, in mm (or degrees for an angle), as read at the truck. */
export interface MeasuredValue {
  pointId: string;
  value: number;
  measuredBy: string;
  measuredAt: string;
}

/** A shop's threshold for "far from the catalog: take a second look". */
export interface DeviationLimits {
  lengthMm: number;
  angleDeg: number;
}

/** Common practice (no published source): a tape reading 15 mm or an angle 1° off the book is worth a second look. */
export const DEFAULT_DEVIATION_LIMITS: DeviationLimits = { lengthMm: 15, angleDeg: 1 };

/**
 * What a shop may set. Common practice (no published source): below half a millimetre or a tenth of a degree every
 * tape or angle-finder reading would be flagged; beyond 500 mm or 20° nothing a tape can get wrong ever would.
 */
export const DEVIATION_LIMIT_BOUNDS = {
  lengthMm: { min: 0.5, max: 500 },
  angleDeg: { min: 0.1, max: 20 },
} as const;

export type InputSource = { kind: 'sheet'; measuredBy: string; measuredAt: string } | { kind: 'catalog' };

/** One input of the fit check that a measurement point governs, and where its value came from. */
export interface ChassisInput {
  pointId: string;
  label: string;
  /** The chassis-spec field it sets. */
  field: string;
  unit: 'mm' | 'deg';
  /** The catalog's reading (what the tape should show), when the catalog has one. */
  catalogValue: number | null;
  /** The tape's reading, when measured. */
  measuredValue: number | null;
  /**
   * Measured minus expected, where the expected reading is the catalog's corrected for the measured ride height
   * (a lifted truck reads every height higher without anything being bent). Null when either is missing.
   */
  deviation: number | null;
  /** |deviation| above the shop's limit. */
  flagged: boolean;
  source: InputSource;
  /** The fit checks that read it. */
  checks: readonly string[];
}

export interface AppliedMeasurements {
  chassis: ChassisSpec;
  /** The ground under the wheels in the chassis frame (z 0 at catalog ride height). */
  ground: { zAtFrontAxleMm: number; zAtRearAxleMm: number; pitchDeg: number };
  inputs: ChassisInput[];
}

const round2 = (value: number): number => Math.round(value * 100) / 100;

/** The ground line in the frame: from the measured ride heights against their datums, 0 where an axle is unmeasured. */
export function groundLineFromRideHeights(
  points: readonly MeasurementPoint[],
  values: ReadonlyMap<string, MeasuredValue>,
  wheelbaseMm: number,
): AppliedMeasurements['ground'] {
  const axleGround = (axle: 'front' | 'rear'): number => {
    const offsets: number[] = [];
    for (const point of points) {
      if (point.kind !== 'ride-height' || !point.target?.startsWith(axle) || point.catalogValue === null) continue;
      const measured = values.get(point.id);
      // The datum sits catalogValue above the catalog ground; measured above the real floor: the floor is the difference.
      if (measured) offsets.push(point.catalogValue - measured.value);
    }
    return offsets.length === 0 ? 0 : offsets.reduce((a, b) => a + b, 0) / offsets.length;
  };
  const zAtFrontAxleMm = round2(axleGround('front'));
  const zAtRearAxleMm = round2(axleGround('rear'));
  // Positive nose up: the floor under the front axle lies further below the frame than under the rear.
  const pitchDeg = (Math.atan2(zAtRearAxleMm - zAtFrontAxleMm, wheelbaseMm) * 180) / Math.PI;
  return { zAtFrontAxleMm, zAtRearAxleMm, pitchDeg: pitchDeg === 0 ? 0 : pitchDeg };
}

function groundZ(ground: AppliedMeasurements['ground'], wheelbaseMm: number, x: number): number {
  return ground.zAtFrontAxleMm + ((ground.zAtRearAxleMm - ground.zAtFrontAxleMm) * x) / wheelbaseMm;
}

/** Maps `[fromLow, fromHigh]` onto `[toLow, toHigh]` (a shift when only one end is given). */
function axisMap(fromLow: number, fromHigh: number, toLow: number | null, toHigh: number | null): (v: number) => number {
  if (toLow !== null && toHigh !== null && fromHigh > fromLow) {
    const scale = (toHigh - toLow) / (fromHigh - fromLow);
    return (v) => toLow + (v - fromLow) * scale;
  }
  if (toLow !== null) return (v) => v + (toLow - fromLow);
  if (toHigh !== null) return (v) => v + (toHigh - fromHigh);
  return (v) => v;
}

/**
 * The chassis as measured: every measured point moves what it measures and keeps the catalog's shape.
 *
 * - Ride heights (floor to the frame at the four corners) move the ground line, not the frame: the frame keeps its
 *   coordinates and the ground sits at `zAtFrontAxleMm` under the front axle and `zAtRearAxleMm` under the rear.
 *   Every other height is read from the floor, so it enters the frame as `reading + ground z at its station`.
 * - An obstacle's top or bottom translates its outline vertically so the measured edge sits where the tape says;
 *   with both measured, the outline is mapped linearly between them. Front and rear faces do the same fore and aft.
 * - A rail width replaces the station's width; a rail underside moves the station's rails up or down (depth kept).
 * - Mount pads, radiator core, hood points, transmission crossmember and pinion take the reading directly.
 * - The pinion angle is read against level; in the frame it is the reading minus the frame's nose-up pitch.
 *
 * Values for points not in `points` are ignored; points without a value keep the catalog's figure.
 */
export function applyMeasurementSheet(
  catalog: ChassisSpec,
  points: readonly MeasurementPoint[],
  measured: readonly MeasuredValue[],
  limits: DeviationLimits = DEFAULT_DEVIATION_LIMITS,
): AppliedMeasurements {
  const values = new Map(measured.map((v) => [v.pointId, v]));
  const wb = catalog.wheelbaseMm;
  const ground = groundLineFromRideHeights(points, values, wb);
  const gz = (x: number): number => groundZ(ground, wb, x);
  /** The frame z of a floor reading at station x. */
  const frameZ = (reading: number, x: number): number => reading + gz(x);
  const valueOf = (point: MeasurementPoint): number | null => values.get(point.id)?.value ?? null;

  const chassis = JSON.parse(JSON.stringify(catalog)) as ChassisSpec;
  const inputs: ChassisInput[] = [];

  // Expected reading at the truck given the measured ground (the catalog's frame figure seen from the real floor).
  const expected = (point: MeasurementPoint, x: number): number | null => {
    if (point.catalogValue === null) return null;
    return isFloorHeight(point.kind) ? point.catalogValue - gz(x) : point.catalogValue;
  };

  for (const point of points) {
    const info = MEASUREMENT_KIND_INFO[point.kind];
    const value = valueOf(point);
    const station = stationOf(point, catalog);
    const want = expected(point, station);
    const deviation = value !== null && want !== null ? round2(value - want) : null;
    const limit = measurementUnit(point.kind) === 'deg' ? limits.angleDeg : limits.lengthMm;
    const source = values.get(point.id);
    inputs.push({
      pointId: point.id,
      label: point.label,
      field: info.overrides,
      unit: measurementUnit(point.kind),
      catalogValue: point.catalogValue,
      measuredValue: value,
      deviation,
      flagged: deviation !== null && Math.abs(deviation) > limit + 1e-9,
      source: source ? { kind: 'sheet', measuredBy: source.measuredBy, measuredAt: source.measuredAt } : { kind: 'catalog' },
      checks: info.feedsChecks,
    });
  }

  // Obstacles: gather each one's measured edges, then map its outline once.
  chassis.obstacles = chassis.obstacles.map((obstacle) => {
    const edge = (kind: MeasurementPoint['kind']): { value: number; point: MeasurementPoint } | null => {
      const point = points.find((p) => p.kind === kind && p.target === obstacle.id && valueOf(p) !== null);
      return point ? { value: valueOf(point)!, point } : null;
    };
    const top = edge('obstacle-top');
    const bottom = edge('obstacle-bottom');
    const front = edge('obstacle-front-face');
    const rear = edge('obstacle-rear-face');
    if (!top && !bottom && !front && !rear) return obstacle;
    const xs = obstacle.outline.map((p) => p.x);
    const zs = obstacle.outline.map((p) => p.z);
    const mapX = axisMap(Math.min(...xs), Math.max(...xs), front?.value ?? null, rear?.value ?? null);
    const topZ = top ? frameZ(top.value, stationOf(top.point, catalog)) : null;
    const bottomZ = bottom ? frameZ(bottom.value, stationOf(bottom.point, catalog)) : null;
    const mapZ = axisMap(Math.min(...zs), Math.max(...zs), bottomZ, topZ);
    return { ...obstacle, outline: obstacle.outline.map((p): ChassisPoint => ({ x: round2(mapX(p.x)), z: round2(mapZ(p.z)) })) };
  });

  // A crossmember the catalog does not have (or no catalog chassis at all): a box from its four measured faces.
  const known = new Set(chassis.obstacles.map((o) => o.id));
  const newTargets = new Set(points.filter((p) => p.kind.startsWith('obstacle-') && p.target && !known.has(p.target)).map((p) => p.target!));
  for (const target of newTargets) {
    const face = (kind: MeasurementPoint['kind']): { value: number; point: MeasurementPoint } | null => {
      const point = points.find((p) => p.kind === kind && p.target === target && valueOf(p) !== null);
      return point ? { value: valueOf(point)!, point } : null;
    };
    const [top, bottom, front, rear] = [face('obstacle-top'), face('obstacle-bottom'), face('obstacle-front-face'), face('obstacle-rear-face')];
    if (!top || !bottom || !front || !rear) continue;
    chassis.obstacles.push(
      crossmemberBox(target, top.point.label.split(':')[0] || target, {
        frontX: front.value,
        rearX: rear.value,
        bottomZ: frameZ(bottom.value, stationOf(bottom.point, catalog)),
        topZ: frameZ(top.value, stationOf(top.point, catalog)),
      }),
    );
  }

  // Rails: a measured station not in the catalog is added with the catalog's interpolated figures.
  const stations = new Map<number, RailStation>(chassis.railStations.map((s) => [s.x, { ...s }]));
  const stationAt = (x: number): RailStation => {
    let station = stations.get(x);
    if (!station) {
      const sorted = [...chassis.railStations].sort((a, b) => a.x - b.x);
      const at = (f: (s: RailStation) => number): number => (sorted.length ? interpolateStations(sorted, (s) => s.x, f, x) : 0);
      station = { x, insideWidthMm: at((s) => s.insideWidthMm), zBottom: at((s) => s.zBottom), zTop: at((s) => s.zTop) };
      stations.set(x, station);
    }
    return station;
  };
  for (const point of points) {
    const value = valueOf(point);
    if (value === null) continue;
    switch (point.kind) {
      case 'rail-inside-width':
        if (point.atX !== undefined) stationAt(point.atX).insideWidthMm = value;
        break;
      case 'rail-bottom':
        if (point.atX !== undefined) {
          const station = stationAt(point.atX);
          const depth = station.zTop - station.zBottom;
          station.zBottom = round2(frameZ(value, point.atX));
          station.zTop = round2(station.zBottom + depth);
        }
        break;
      case 'mount-pad-height':
        if (point.target === 'left' || point.target === 'right') {
          const pad = chassis.mountPads[point.target];
          chassis.mountPads[point.target] = { ...pad, z: round2(frameZ(value, stationOf(point, catalog))) };
        }
        break;
      case 'mount-pad-setback':
        if (point.target === 'left' || point.target === 'right') chassis.mountPads[point.target] = { ...chassis.mountPads[point.target], x: value };
        break;
      case 'mount-pad-spacing':
        chassis.mountPads = {
          left: { ...chassis.mountPads.left, y: -value / 2 },
          right: { ...chassis.mountPads.right, y: value / 2 },
        };
        break;
      case 'radiator-core-face':
        chassis.radiatorCore = { ...chassis.radiatorCore, x: -value };
        break;
      case 'radiator-core-top':
        chassis.radiatorCore = { ...chassis.radiatorCore, zTo: round2(frameZ(value, stationOf(point, catalog))) };
        break;
      case 'radiator-core-bottom':
        chassis.radiatorCore = { ...chassis.radiatorCore, zFrom: round2(frameZ(value, stationOf(point, catalog))) };
        break;
      case 'hood-line':
        if (point.atX !== undefined) {
          const x = point.atX;
          const z = round2(frameZ(value, x));
          const others = chassis.hoodLine.filter((p) => p.x !== x);
          chassis.hoodLine = [...others, { x, z }].sort((a, b) => a.x - b.x);
        }
        break;
      case 'transmission-crossmember-setback':
        chassis.transmissionCrossmember = { ...chassis.transmissionCrossmember, x: value };
        break;
      case 'transmission-crossmember-height':
        chassis.transmissionCrossmember = {
          ...chassis.transmissionCrossmember,
          z: round2(frameZ(value, stationOf(point, catalog))),
        };
        break;
      case 'pinion-height':
        chassis.pinion = { ...chassis.pinion, z: round2(frameZ(value, stationOf(point, catalog))) };
        break;
      case 'pinion-angle':
        chassis.pinion = { ...chassis.pinion, angleDeg: round2(value - ground.pitchDeg) };
        break;
      default:
        break;
    }
  }
  chassis.railStations = [...stations.values()].sort((a, b) => a.x - b.x);
  if (ground.zAtFrontAxleMm !== 0 || ground.zAtRearAxleMm !== 0) {
    chassis.groundLine = { zAtFrontAxleMm: ground.zAtFrontAxleMm, zAtRearAxleMm: ground.zAtRearAxleMm };
  }
  return { chassis, ground, inputs };
}

/** A crossmember described only by its four faces: the box between them, as a closed outline. */
export function crossmemberBox(
  id: string,
  name: string,
  faces: { frontX: number; rearX: number; bottomZ: number; topZ: number },
): ChassisObstacle {
  const x0 = round2(Math.min(faces.frontX, faces.rearX));
  const x1 = round2(Math.max(faces.frontX, faces.rearX));
  const z0 = round2(Math.min(faces.bottomZ, faces.topZ));
  const z1 = round2(Math.max(faces.bottomZ, faces.topZ));
  return {
    id,
    name,
    kind: 'crossmember',
    outline: [
      { x: x0, z: z0 },
      { x: x1, z: z0 },
      { x: x1, z: z1 },
      { x: x0, z: z1 },
    ],
  };
}

/** Where along the chassis a point's reading is taken (for the ground line under a height). */
function stationOf(point: MeasurementPoint, chassis: ChassisSpec): number {
  if (point.atX !== undefined) return point.atX;
  switch (point.kind) {
    case 'mount-pad-height':
      return point.target === 'right' ? chassis.mountPads.right.x : chassis.mountPads.left.x;
    case 'radiator-core-top':
    case 'radiator-core-bottom':
      return chassis.radiatorCore.x;
    case 'transmission-crossmember-height':
      return chassis.transmissionCrossmember.x;
    case 'pinion-height':
      return chassis.pinion.x;
    default:
      return 0;
  }
}

/** The points that still need a reading: required and without a value. */
export function missingPoints(points: readonly MeasurementPoint[], measuredIds: ReadonlySet<string>): MeasurementPoint[] {
  return points.filter((p) => p.required && !measuredIds.has(p.id));
}
