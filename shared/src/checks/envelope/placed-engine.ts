import { placeEngineOutline, placeEnginePoint } from '../../geometry/placement';
import { groundZAt } from '../../geometry/ground-line';
import type { AccessoryDriveSpec, ChassisObstacle, ChassisPoint, ChassisSpec, FitSpec, OilPanSpec, Placement } from '../../types/fit-spec';

/** A width feature (exhaust, heads, accessory drive) placed in the chassis: its side-view box and its half widths. */
export interface PlacedWidthBox {
  id: string;
  name: string;
  source: 'accessory-drive' | 'width-feature';
  xMin: number;
  xMax: number;
  zMin: number;
  zMax: number;
  halfWidthLeftMm: number;
  halfWidthRightMm: number;
}

/** The engine's outlines placed in the chassis frame once per placement; the checks read from here. */
export interface PlacedEngine {
  placement: Placement;
  pan: ChassisPoint[] | null;
  topProfile: ChassisPoint[];
  rearProfile: ChassisPoint[];
  transmission: ChassisPoint[] | null;
  /** Front faces: the fan and the chosen accessory drive, each as a segment (two points). */
  fanFace: ChassisPoint[];
  driveFace: ChassisPoint[];
  drive: AccessoryDriveSpec | null;
  widthBoxes: PlacedWidthBox[];
}

/** The accessory drive the spec chose, or the engine's first. */
export function chosenDrive(spec: FitSpec): AccessoryDriveSpec | null {
  const drives = spec.engine.accessoryDrives ?? [];
  return drives.find((d) => d.id === spec.accessoryDriveId) ?? drives[0] ?? null;
}

/** u of the front of the block: the front end of the pan rail (u forward). */
export function blockFrontU(spec: FitSpec): number {
  return Math.max(spec.engine.panRail.uFrom, spec.engine.panRail.uTo);
}

export function placeBox(
  uFrom: number,
  uTo: number,
  wFrom: number,
  wTo: number,
  placement: Placement,
): { xMin: number; xMax: number; zMin: number; zMax: number } {
  const corners = [
    placeEnginePoint({ u: uFrom, w: wFrom }, placement),
    placeEnginePoint({ u: uFrom, w: wTo }, placement),
    placeEnginePoint({ u: uTo, w: wFrom }, placement),
    placeEnginePoint({ u: uTo, w: wTo }, placement),
  ];
  return {
    xMin: Math.min(...corners.map((c) => c.x)),
    xMax: Math.max(...corners.map((c) => c.x)),
    zMin: Math.min(...corners.map((c) => c.z)),
    zMax: Math.max(...corners.map((c) => c.z)),
  };
}

export function driveWidthBox(spec: FitSpec, drive: AccessoryDriveSpec, placement: Placement): PlacedWidthBox {
  const front = blockFrontU(spec);
  const box = placeBox(Math.min(front, drive.frontFaceU), drive.frontFaceU, drive.wMin, drive.wMax, placement);
  return {
    id: drive.id,
    name: drive.name,
    source: 'accessory-drive',
    ...box,
    halfWidthLeftMm: drive.halfWidthLeftMm,
    halfWidthRightMm: drive.halfWidthRightMm,
  };
}

export function placePan(pan: OilPanSpec, placement: Placement): ChassisPoint[] {
  return placeEngineOutline(pan.bottomProfile, placement);
}

export function placeEngine(spec: FitSpec, placement: Placement = spec.placement, pan: OilPanSpec | undefined = spec.oilPan): PlacedEngine {
  const engine = spec.engine;
  const drive = chosenDrive(spec);
  const widthBoxes: PlacedWidthBox[] = (engine.widthFeatures ?? []).map((f) => ({
    id: f.id,
    name: f.name,
    source: 'width-feature' as const,
    ...placeBox(f.uFrom, f.uTo, f.wFrom, f.wTo, placement),
    halfWidthLeftMm: f.halfWidthLeftMm,
    halfWidthRightMm: f.halfWidthRightMm,
  }));
  if (drive) widthBoxes.unshift(driveWidthBox(spec, drive, placement));
  return {
    placement,
    pan: pan ? placePan(pan, placement) : null,
    topProfile: placeEngineOutline(engine.topProfile ?? [], placement),
    rearProfile: placeEngineOutline(engine.rearProfile ?? [], placement),
    transmission: spec.transmission ? placeEngineOutline(spec.transmission.sideProfile, placement) : null,
    fanFace: [
      placeEnginePoint({ u: engine.fanFrontU, w: engine.fanWFrom }, placement),
      placeEnginePoint({ u: engine.fanFrontU, w: engine.fanWTo }, placement),
    ],
    driveFace: drive
      ? [placeEnginePoint({ u: drive.frontFaceU, w: drive.wMin }, placement), placeEnginePoint({ u: drive.frontFaceU, w: drive.wMax }, placement)]
      : [],
    drive,
    widthBoxes,
  };
}

const cache = new WeakMap<FitSpec, { key: string; parts: unknown[]; placed: PlacedEngine }>();

/** placeEngine for spec.placement, memoised per spec object (the checks of one run share it). */
export function placedForSpec(spec: FitSpec): PlacedEngine {
  const p = spec.placement;
  const key = `${p.setbackMm}|${p.heightMm}|${p.tiltDeg}|${spec.oilPan?.id ?? ''}|${spec.accessoryDriveId ?? ''}|${spec.transmission?.id ?? ''}`;
  const parts: unknown[] = [spec.engine, spec.oilPan, spec.transmission];
  const hit = cache.get(spec);
  if (hit && hit.key === key && hit.parts.every((part, i) => part === parts[i])) return hit.placed;
  const placed = placeEngine(spec);
  cache.set(spec, { key, parts, placed });
  return placed;
}

/** The parts whose outlines can set the lowest point under the vehicle. */
export type LowestPart = 'oil pan' | 'engine' | 'transmission';

export interface LowestPoint {
  point: ChassisPoint;
  part: LowestPart;
  /** Height above the ground under it (the ground is z = 0 at ride height, or the chassis's measured ground line). */
  clearanceMm: number;
}

/**
 * The point of everything placed — oil pan, engine outlines, and the transmission with its bellhousing —
 * nearest the ground, and which part it belongs to. `dz` shifts the whole engine up (+) or down (−).
 */
export function lowestPoint(placed: PlacedEngine, dz = 0, chassis?: Pick<ChassisSpec, 'groundLine' | 'wheelbaseMm'>): LowestPoint | null {
  let best: LowestPoint | null = null;
  const visit = (points: readonly ChassisPoint[] | null, part: LowestPart): void => {
    for (const p of points ?? []) {
      const clearanceMm = p.z + dz - (chassis ? groundZAt(chassis, p.x) : 0);
      if (best === null || clearanceMm < best.clearanceMm) best = { point: { x: p.x, z: p.z + dz }, part, clearanceMm };
    }
  };
  visit(placed.pan, 'oil pan');
  visit(placed.topProfile, 'engine');
  visit(placed.rearProfile, 'engine');
  visit(placed.transmission, 'transmission');
  return best;
}

export function obstaclesOfKinds(spec: FitSpec, kinds: readonly ChassisObstacle['kind'][]): ChassisObstacle[] {
  return (spec.chassis.obstacles ?? []).filter((o) => kinds.includes(o.kind) && o.outline.length >= 3);
}

export function withPlacement(spec: FitSpec, placement: Partial<Placement>): FitSpec {
  return { ...spec, placement: { ...spec.placement, ...placement } };
}
