import { placeEnginePoint, type FitSpec, type RailStation } from '@swapwright/shared';

export type FrontBox = {
  id: string;
  name: string;
  kind: 'accessory-drive' | 'width-feature';
  yLeft: number;
  yRight: number;
  zMin: number;
  zMax: number;
  xMin: number;
  xMax: number;
};

export type FrontGap = { id: string; label: string; side: 'left' | 'right'; fromY: number; toY: number; z: number; valueMm: number };

export type FrontScene = {
  station: RailStation | null;
  boxes: FrontBox[];
  steeringBox: { yFrom: number; yTo: number; zFrom: number; zTo: number; side: 'left' | 'right' } | null;
  crank: { y: number; z: number };
  gaps: FrontGap[];
  bounds: { yMin: number; yMax: number; zMin: number; zMax: number };
};

const RAIL_THICKNESS = 70;
const BOX_DEPTH = 140;

function placedBox(spec: FitSpec, uFrom: number, uTo: number, wFrom: number, wTo: number) {
  const p = spec.placement;
  const corners = [
    placeEnginePoint({ u: uFrom, w: wFrom }, p),
    placeEnginePoint({ u: uFrom, w: wTo }, p),
    placeEnginePoint({ u: uTo, w: wFrom }, p),
    placeEnginePoint({ u: uTo, w: wTo }, p),
  ];
  return {
    xMin: Math.min(...corners.map((c) => c.x)),
    xMax: Math.max(...corners.map((c) => c.x)),
    zMin: Math.min(...corners.map((c) => c.z)),
    zMax: Math.max(...corners.map((c) => c.z)),
  };
}

/** The widths seen from the front: the narrowest rail station along the engine, the width boxes and the steering box. */
export function buildFrontScene(spec: FitSpec): FrontScene {
  const e = spec.engine;
  const boxes: FrontBox[] = e.widthFeatures.map((f) => ({
    id: f.id,
    name: f.name,
    kind: 'width-feature',
    yLeft: -f.halfWidthLeftMm,
    yRight: f.halfWidthRightMm,
    ...placedBox(spec, f.uFrom, f.uTo, f.wFrom, f.wTo),
  }));
  const drive = e.accessoryDrives.find((d) => d.id === spec.accessoryDriveId) ?? e.accessoryDrives[0];
  if (drive) {
    const front = Math.max(e.panRail.uFrom, e.panRail.uTo);
    boxes.push({
      id: drive.id,
      name: drive.name,
      kind: 'accessory-drive',
      yLeft: -drive.halfWidthLeftMm,
      yRight: drive.halfWidthRightMm,
      ...placedBox(spec, Math.min(front, drive.frontFaceU), drive.frontFaceU, drive.wMin, drive.wMax),
    });
  }
  const xMin = Math.min(...boxes.map((b) => b.xMin), spec.placement.setbackMm - 600);
  const xMax = Math.max(...boxes.map((b) => b.xMax), spec.placement.setbackMm);
  const stations = spec.chassis.railStations ?? [];
  const along = stations.filter((s) => s.x >= xMin && s.x <= xMax);
  const pool = along.length ? along : stations;
  const station = pool.length ? pool.reduce((n, s) => (s.insideWidthMm < n.insideWidthMm ? s : n)) : null;

  const sb = spec.chassis.steeringBox;
  const steeringBox = sb
    ? {
        side: sb.side,
        zFrom: sb.zFrom,
        zTo: sb.zTo,
        yFrom: sb.side === 'left' ? sb.inboardY - BOX_DEPTH : sb.inboardY,
        yTo: sb.side === 'left' ? sb.inboardY : sb.inboardY + BOX_DEPTH,
      }
    : null;

  const gaps: FrontGap[] = [];
  if (station) {
    const half = station.insideWidthMm / 2;
    const overlapping = boxes.filter((b) => b.zMax > station.zBottom && b.zMin < station.zTop);
    for (const side of ['left', 'right'] as const) {
      let worst: FrontGap | null = null;
      for (const b of overlapping) {
        const edge = side === 'left' ? b.yLeft : b.yRight;
        const value = half - Math.abs(edge);
        const z = (Math.max(b.zMin, station.zBottom) + Math.min(b.zMax, station.zTop)) / 2;
        if (!worst || value < worst.valueMm)
          worst = { id: `rail-${side}`, label: `${b.name} to ${side} rail`, side, fromY: edge, toY: side === 'left' ? -half : half, z, valueMm: value };
      }
      if (worst) gaps.push(worst);
    }
  }
  if (steeringBox && sb) {
    const inX = boxes.filter((b) => b.xMin < sb.xTo && b.xMax > sb.xFrom && b.zMax > sb.zFrom && b.zMin < sb.zTo);
    let worst: FrontGap | null = null;
    for (const b of inX) {
      const edge = sb.side === 'left' ? b.yLeft : b.yRight;
      const value = Math.abs(sb.inboardY) - Math.abs(edge);
      const z = (Math.max(b.zMin, sb.zFrom) + Math.min(b.zMax, sb.zTo)) / 2;
      if (!worst || value < worst.valueMm) worst = { id: 'steering-box', label: `${b.name} to steering box`, side: sb.side, fromY: edge, toY: sb.inboardY, z, valueMm: value };
    }
    if (worst) gaps.push(worst);
  }

  const ys = [...boxes.flatMap((b) => [b.yLeft, b.yRight]), ...(station ? [-station.insideWidthMm / 2 - RAIL_THICKNESS, station.insideWidthMm / 2 + RAIL_THICKNESS] : []), ...(steeringBox ? [steeringBox.yFrom, steeringBox.yTo] : [])];
  const zs = [...boxes.flatMap((b) => [b.zMin, b.zMax]), ...(station ? [station.zBottom, station.zTop] : []), ...(steeringBox ? [steeringBox.zFrom, steeringBox.zTo] : []), spec.placement.heightMm, 0];
  return {
    station,
    boxes,
    steeringBox,
    crank: { y: 0, z: spec.placement.heightMm },
    gaps,
    bounds: { yMin: Math.min(...ys, -400), yMax: Math.max(...ys, 400), zMin: Math.min(...zs), zMax: Math.max(...zs) },
  };
}

export const FRONT_RAIL_THICKNESS = RAIL_THICKNESS;
