import {
  FAN_RADIATOR_ID,
  GROUND_CLEARANCE_ID,
  HEADS_FIREWALL_ID,
  HOOD_ID,
  PAN_CHECK_IDS,
  placeEngineOutline,
  placeEnginePoint,
  TRANSMISSION_TUNNEL_ID,
  type ChassisObstacle,
  type Finding,
  type FitSpec,
  type Placement,
} from '@swapwright/shared';
import { boundsOf, insidePolygon, nearestPoints, zAt, type Bounds, type Pt } from './scene-geometry';

export type GapDimension = {
  checkId: string;
  title: string;
  status: Finding['status'];
  /** The figure the engine found (mm); the drawn line only places it. */
  valueMm: number;
  from: Pt;
  to: Pt;
};

export type SideScene = {
  bounds: Bounds;
  obstacles: ChassisObstacle[];
  hoodLine: Pt[];
  radiator: { x: number; zFrom: number; zTo: number } | null;
  block: Pt[];
  topProfile: Pt[];
  rearProfile: Pt[];
  /** Closed along the pan rail. */
  pan: Pt[] | null;
  transmission: Pt[] | null;
  fanFace: [Pt, Pt];
  crank: { origin: Pt; front: Pt; rear: Pt };
  dimensions: GapDimension[];
};

/** Which engine outline each side-view clearance is measured from. */
type Source = 'pan' | 'top' | 'rear' | 'transmission' | 'fan' | 'lowest';

function sourceOf(checkId: string): Source | null {
  if (PAN_CHECK_IDS.includes(checkId)) return 'pan';
  if (checkId === HOOD_ID) return 'top';
  if (checkId === HEADS_FIREWALL_ID) return 'rear';
  if (checkId === TRANSMISSION_TUNNEL_ID) return 'transmission';
  if (checkId === FAN_RADIATOR_ID) return 'fan';
  if (checkId === GROUND_CLEARANCE_ID) return 'lowest';
  return null;
}

/** The engine outline with the pan closed along the rail. */
function closedPan(spec: FitSpec, placement: Placement): Pt[] | null {
  const pan = spec.oilPan;
  if (!pan || pan.bottomProfile.length === 0) return null;
  const profile = [...pan.bottomProfile];
  const railW = spec.engine.panRail.w;
  const first = profile[0];
  const last = profile[profile.length - 1];
  if (first.w !== railW) profile.unshift({ u: first.u, w: railW });
  if (last.w !== railW) profile.push({ u: last.u, w: railW });
  return placeEngineOutline(profile, placement);
}

function blockOutline(spec: FitSpec, placement: Placement): Pt[] {
  const e = spec.engine;
  const railW = e.panRail.w;
  const front = Math.max(e.panRail.uFrom, e.panRail.uTo);
  const rear = Math.min(e.panRail.uFrom, e.panRail.uTo, 0);
  const top = [...e.topProfile].sort((a, b) => b.u - a.u);
  const back = [...e.rearProfile].sort((a, b) => b.w - a.w);
  const pts = [{ u: front, w: railW }, ...top, ...back, { u: rear, w: railW }];
  return placeEngineOutline(pts, placement);
}

/** Every piece of the side view placed in the chassis frame, with the clearances to dimension. */
export function buildSideScene(spec: FitSpec, findings: readonly Finding[] = [], maxDimensions = 5): SideScene {
  const placement = spec.placement;
  const e = spec.engine;
  const c = spec.chassis;
  const topProfile = placeEngineOutline([...e.topProfile].sort((a, b) => b.u - a.u), placement);
  const rearProfile = placeEngineOutline(e.rearProfile, placement);
  const pan = closedPan(spec, placement);
  const transmission = spec.transmission?.sideProfile.length ? placeEngineOutline(spec.transmission.sideProfile, placement) : null;
  const fanFace: [Pt, Pt] = [placeEnginePoint({ u: e.fanFrontU, w: e.fanWFrom }, placement), placeEnginePoint({ u: e.fanFrontU, w: e.fanWTo }, placement)];
  const origin = { x: placement.setbackMm, z: placement.heightMm };
  const crank = {
    origin,
    front: placeEnginePoint({ u: e.fanFrontU, w: 0 }, placement),
    rear: placeEnginePoint({ u: -(spec.transmission?.lengthToOutputMm ?? 300), w: 0 }, placement),
  };
  const radiator = c.radiatorCore ? { x: c.radiatorCore.x, zFrom: c.radiatorCore.zFrom, zTo: c.radiatorCore.zTo } : null;
  const block = blockOutline(spec, placement);

  const outlineFor = (source: Source): { pts: Pt[]; closed: boolean } | null => {
    if (source === 'pan') return pan ? { pts: pan, closed: true } : null;
    if (source === 'top') return { pts: topProfile, closed: false };
    if (source === 'rear') return { pts: rearProfile, closed: false };
    if (source === 'transmission') return transmission ? { pts: transmission, closed: true } : null;
    if (source === 'fan') return { pts: fanFace, closed: false };
    return null;
  };

  const allEngine = [...(pan ?? []), ...topProfile, ...rearProfile, ...(transmission ?? []), ...fanFace];
  const candidates = findings
    .filter((f) => f.unit === 'mm' && f.measured !== null && sourceOf(f.checkId) !== null)
    .sort((a, b) => (a.margin ?? Infinity) - (b.margin ?? Infinity))
    .slice(0, maxDimensions);

  const dimensions: GapDimension[] = [];
  for (const f of candidates) {
    const source = sourceOf(f.checkId)!;
    const value = f.measured as number;
    const base = { checkId: f.checkId, title: f.title, status: f.status, valueMm: value };
    if (source === 'lowest') {
      const lowest = allEngine.reduce((lo, p) => (p.z < lo.z ? p : lo), allEngine[0] ?? origin);
      dimensions.push({ ...base, from: lowest, to: { x: lowest.x, z: 0 } });
      continue;
    }
    if (source === 'fan') {
      if (!radiator) continue;
      const z = (Math.max(fanFace[0].z, radiator.zFrom) + Math.min(fanFace[1].z, radiator.zTo)) / 2;
      dimensions.push({ ...base, from: { x: Math.min(fanFace[0].x, fanFace[1].x), z }, to: { x: radiator.x, z } });
      continue;
    }
    const outline = outlineFor(source);
    if (!outline) continue;
    if (source === 'top') {
      // vertical gap under the hood at the tightest point of the top profile
      let best: { from: Pt; to: Pt; d: number } | null = null;
      for (const p of outline.pts) {
        const hz = zAt(c.hoodLine, p.x);
        if (hz === null) continue;
        if (!best || hz - p.z < best.d) best = { from: p, to: { x: p.x, z: hz }, d: hz - p.z };
      }
      if (best) dimensions.push({ ...base, from: best.from, to: best.to });
      continue;
    }
    const obstacle = c.obstacles.find((o) => o.id === f.against) ?? c.obstacles.find((o) => f.against && o.name === f.against);
    if (!obstacle) continue;
    if (value < 0) {
      // overlap: show the lift needed at the deepest engine point inside the obstacle
      const inside = outline.pts.filter((p) => insidePolygon(p, obstacle.outline));
      const at = inside.length ? inside.reduce((lo, p) => (p.z < lo.z ? p : lo)) : nearestPoints(outline.pts, outline.closed, obstacle.outline, true)?.from;
      if (!at) continue;
      dimensions.push({ ...base, from: at, to: { x: at.x, z: at.z - value } });
      continue;
    }
    const near = nearestPoints(outline.pts, outline.closed, obstacle.outline, true);
    if (near) dimensions.push({ ...base, ...near });
  }

  const bounds = boundsOf([
    ...c.obstacles.map((o) => o.outline),
    c.hoodLine,
    radiator ? [{ x: radiator.x, z: radiator.zFrom }, { x: radiator.x, z: radiator.zTo }] : [],
    allEngine,
    block,
    [crank.front, crank.rear, { x: crank.front.x, z: 0 }],
  ]);
  return {
    bounds: { ...bounds, zMin: Math.min(bounds.zMin, 0) },
    obstacles: c.obstacles,
    hoodLine: c.hoodLine,
    radiator,
    block,
    topProfile,
    rearProfile,
    pan,
    transmission,
    fanFace,
    crank,
    dimensions,
  };
}
