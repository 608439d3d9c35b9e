import { FAN_RADIATOR_ID, measureFanGap } from '../checks/envelope/fan-radiator';
import { GROUND_CLEARANCE_ID } from '../checks/envelope/ground-clearance';
import { groundZAt } from '../geometry/ground-line';
import { FIREWALL_KINDS, HEADS_FIREWALL_ID } from '../checks/envelope/heads-firewall';
import { HOOD_ID, measureHood } from '../checks/envelope/hood';
import { PAN_CHECKS } from '../checks/envelope/pan-checks';
import { lowestPoint, obstaclesOfKinds, placedForSpec, type PlacedEngine, type PlacedWidthBox } from '../checks/envelope/placed-engine';
import { measureRailWidth, RAIL_WIDTH_ID } from '../checks/envelope/rail-width';
import { measureSteeringBox, STEERING_BOX_ID } from '../checks/envelope/steering-box';
import { TRANSMISSION_TUNNEL_ID, TUNNEL_KINDS } from '../checks/envelope/transmission-tunnel';
import { flattenDistance } from '../geometry/flatten-gap';
import { outlineGapToward, type SeparationDirection } from '../geometry/outline-gap';
import { interpolateStations } from '../geometry/interpolate';
import { resolveFitSettings, type FitSettings } from '../settings/fit-settings';
import type { ChassisObstacle, ChassisPoint, FitSpec, Placement } from '../types/fit-spec';

/** A dimension line for the drawing: two points and the gap between them (negative: overlap). */
export interface DimensionSegment {
  checkId: string;
  against: string;
  from: ChassisPoint;
  to: ChassisPoint;
  valueMm: number;
  requiredMm: number;
  /** Below the required gap. */
  short: boolean;
}

/** Placed engine outlines in the chassis frame (x rearward, z up), plus what surrounds them. */
export interface SideViewGeometry
  extends Pick<PlacedEngine, 'placement' | 'pan' | 'topProfile' | 'rearProfile' | 'transmission' | 'fanFace' | 'driveFace'> {
  obstacles: Array<Pick<ChassisObstacle, 'id' | 'name' | 'kind' | 'outline'>>;
  hoodLine: ChassisPoint[];
  radiator: { x: number; zFrom: number; zTo: number } | null;
  /** The ground from xFrom (height z) to xTo (height zTo): level at z 0 unless the chassis has a measured ground line. */
  ground: { z: number; zTo: number; xFrom: number; xTo: number };
  /** The tightest gap of each side-view check, tightest first. */
  dimensions: DimensionSegment[];
  /** A box around everything, for the SVG viewBox. */
  bounds: { xMin: number; xMax: number; zMin: number; zMax: number };
}

function outlineDimension(
  checkId: string,
  outline: readonly ChassisPoint[] | null,
  closed: boolean,
  obstacles: readonly ChassisObstacle[],
  required: number,
  direction: SeparationDirection,
): DimensionSegment | null {
  if (!outline || outline.length === 0) return null;
  let best: DimensionSegment | null = null;
  for (const o of obstacles) {
    const g = outlineGapToward(outline, closed, o.outline, 0, direction);
    if (best !== null && g.gap >= best.valueMm) continue;
    let from = g.from;
    let to = g.to;
    if (!g.overlapping) {
      // The shortest segment as @flatten-js/core computes it (the hand path's witness agrees in the tests).
      const f = flattenDistance(outline, closed, o.outline);
      from = f.from;
      to = f.to;
    }
    best = { checkId, against: o.id, from, to, valueMm: g.gap, requiredMm: required, short: g.gap < required };
  }
  return best;
}

/** Placed outlines and dimensioned tightest gaps for the web's side-view SVG. */
export function sideViewGeometry(spec: FitSpec, settingsOverrides: Partial<FitSettings> = {}): SideViewGeometry {
  const settings = resolveFitSettings(settingsOverrides);
  const placed = placedForSpec(spec);
  const dims: DimensionSegment[] = [];
  const push = (d: DimensionSegment | null): void => {
    if (d) dims.push(d);
  };
  for (const check of PAN_CHECKS) push(outlineDimension(check.id, placed.pan, true, obstaclesOfKinds(spec, check.obstacleKinds), settings.minGapBelowMm, 'up'));
  push(outlineDimension(HEADS_FIREWALL_ID, placed.rearProfile, false, obstaclesOfKinds(spec, [...FIREWALL_KINDS]), settings.minFirewallGapMm, 'forward'));
  push(outlineDimension(TRANSMISSION_TUNNEL_ID, placed.transmission, true, obstaclesOfKinds(spec, [...TUNNEL_KINDS]), settings.minFirewallGapMm, 'down'));
  if (placed.pan) {
    const low = lowestPoint(placed, 0, spec.chassis);
    if (low) {
      push({
        checkId: GROUND_CLEARANCE_ID,
        against: 'ground',
        from: low.point,
        to: { x: low.point.x, z: low.point.z - low.clearanceMm },
        valueMm: low.clearanceMm,
        requiredMm: settings.minGroundClearanceMm,
        short: low.clearanceMm < settings.minGroundClearanceMm,
      });
    }
  }
  const hood = measureHood(placed, spec.chassis.hoodLine);
  if (hood) {
    push({ checkId: HOOD_ID, against: 'hood', from: hood.from, to: hood.to, valueMm: hood.clearance, requiredMm: settings.minHoodGapMm, short: hood.clearance < settings.minHoodGapMm });
  }
  const core = spec.chassis.radiatorCore;
  if (core) {
    const fan = measureFanGap(placed, core.x);
    if (fan) {
      push({
        checkId: FAN_RADIATOR_ID,
        against: 'radiator-core',
        from: fan.point,
        to: { x: core.x, z: fan.point.z },
        valueMm: fan.gap,
        requiredMm: settings.minFanToCoreMm,
        short: fan.gap < settings.minFanToCoreMm,
      });
    }
  }
  dims.sort((a, b) => a.valueMm - a.requiredMm - (b.valueMm - b.requiredMm));
  const all: ChassisPoint[] = [
    ...(placed.pan ?? []),
    ...placed.topProfile,
    ...placed.rearProfile,
    ...(placed.transmission ?? []),
    ...placed.fanFace,
    ...placed.driveFace,
    ...spec.chassis.obstacles.flatMap((o) => o.outline),
    ...spec.chassis.hoodLine,
    { x: 0, z: 0 },
  ];
  if (core) all.push({ x: core.x, z: core.zFrom }, { x: core.x, z: core.zTo });
  const xs = all.map((p) => p.x);
  const zs = all.map((p) => p.z);
  const bounds = { xMin: Math.min(...xs), xMax: Math.max(...xs), zMin: Math.min(0, ...zs), zMax: Math.max(...zs) };
  return {
    placement: { ...spec.placement },
    pan: placed.pan,
    topProfile: placed.topProfile,
    rearProfile: placed.rearProfile,
    transmission: placed.transmission,
    fanFace: placed.fanFace,
    driveFace: placed.driveFace,
    obstacles: spec.chassis.obstacles.map((o) => ({ id: o.id, name: o.name, kind: o.kind, outline: o.outline })),
    hoodLine: spec.chassis.hoodLine,
    radiator: core ? { x: core.x, zFrom: core.zFrom, zTo: core.zTo } : null,
    ground: { z: groundZAt(spec.chassis, bounds.xMin), zTo: groundZAt(spec.chassis, bounds.xMax), xFrom: bounds.xMin, xTo: bounds.xMax },
    dimensions: dims,
    bounds,
  };
}

/** Front view (y right, z up): the width boxes, the rails at the tightest station, the steering box. */
export interface FrontViewGeometry {
  placement: Placement;
  features: Array<{ id: string; name: string; source: PlacedWidthBox['source']; yLeft: number; yRight: number; zFrom: number; zTo: number; xFrom: number; xTo: number }>;
  /** The rails' inside faces where the tightest feature meets them (or at the front station). */
  rails: { x: number; leftY: number; rightY: number; zBottom: number; zTop: number } | null;
  steeringBox: { side: 'left' | 'right'; inboardY: number; zFrom: number; zTo: number } | null;
  dimensions: Array<{ checkId: string; against: string; from: { y: number; z: number }; to: { y: number; z: number }; valueMm: number; requiredMm: number; short: boolean }>;
}

export function frontViewGeometry(spec: FitSpec, settingsOverrides: Partial<FitSettings> = {}): FrontViewGeometry {
  const settings = resolveFitSettings(settingsOverrides);
  const placed = placedForSpec(spec);
  const features = placed.widthBoxes.map((b) => ({
    id: b.id,
    name: b.name,
    source: b.source,
    yLeft: -b.halfWidthLeftMm,
    yRight: b.halfWidthRightMm,
    zFrom: b.zMin,
    zTo: b.zMax,
    xFrom: b.xMin,
    xTo: b.xMax,
  }));
  const dimensions: FrontViewGeometry['dimensions'] = [];
  let rails: FrontViewGeometry['rails'] = null;
  const stations = spec.chassis.railStations ?? [];
  if (stations.length) {
    const contact = measureRailWidth(placed.widthBoxes, stations);
    const sorted = [...stations].sort((a, b) => a.x - b.x);
    const x = contact?.x ?? sorted[0].x;
    const width = interpolateStations(sorted, (s) => s.x, (s) => s.insideWidthMm, x);
    rails = {
      x,
      leftY: -width / 2,
      rightY: width / 2,
      zBottom: interpolateStations(sorted, (s) => s.x, (s) => s.zBottom, x),
      zTop: interpolateStations(sorted, (s) => s.x, (s) => s.zTop, x),
    };
    if (contact) {
      const z = (Math.max(contact.box.zMin, contact.railZBottom) + Math.min(contact.box.zMax, contact.railZTop)) / 2;
      const sign = contact.side === 'left' ? -1 : 1;
      const half = contact.side === 'left' ? contact.box.halfWidthLeftMm : contact.box.halfWidthRightMm;
      dimensions.push({
        checkId: RAIL_WIDTH_ID,
        against: `frame-rail-${contact.side}`,
        from: { y: sign * half, z },
        to: { y: (sign * contact.insideWidthMm) / 2, z },
        valueMm: contact.gap,
        requiredMm: settings.minRailGapMm,
        short: contact.gap < settings.minRailGapMm,
      });
    }
  }
  const sb = spec.chassis.steeringBox;
  if (sb) {
    const s = measureSteeringBox(placed.widthBoxes, sb);
    if (s) {
      const z = (Math.max(s.box.zMin, sb.zFrom) + Math.min(s.box.zMax, sb.zTo)) / 2;
      const y = sb.side === 'left' ? -s.box.halfWidthLeftMm : s.box.halfWidthRightMm;
      dimensions.push({ checkId: STEERING_BOX_ID, against: 'steering-box', from: { y, z }, to: { y: sb.inboardY, z }, valueMm: s.gap, requiredMm: settings.minSteeringBoxGapMm, short: s.gap < settings.minSteeringBoxGapMm });
    }
  }
  return {
    placement: { ...spec.placement },
    features,
    rails,
    steeringBox: sb ? { side: sb.side, inboardY: sb.inboardY, zFrom: sb.zFrom, zTo: sb.zTo } : null,
    dimensions,
  };
}
