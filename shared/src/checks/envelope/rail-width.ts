import { interpolateStations } from '../../geometry/interpolate';
import type { FitSettings } from '../../settings/fit-settings';
import type { Finding, Remedy } from '../../types/finding';
import type { RailStation, SideName } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures } from './envelope-common';
import { driveWidthBox, placedForSpec, type PlacedEngine, type PlacedWidthBox } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export const RAIL_WIDTH_ID = 'envelope.rail-width';

export interface WidthContact {
  box: PlacedWidthBox;
  side: SideName;
  /** Station x where the gap is smallest, the rails' inside width there, and the lateral gap. */
  x: number;
  insideWidthMm: number;
  gap: number;
  railZBottom: number;
  railZTop: number;
}

const sortedCache = new WeakMap<readonly RailStation[], RailStation[]>();

/** Stations front to rear (cached per input array; the fit window asks for them many times). */
function sortedStations(stations: readonly RailStation[]): RailStation[] {
  let sorted = sortedCache.get(stations);
  if (!sorted) {
    sorted = [...stations].sort((a, b) => a.x - b.x);
    sortedCache.set(stations, sorted);
  }
  return sorted;
}

const at = (stations: RailStation[], x: number, f: (s: RailStation) => number): number => interpolateStations(stations, (s) => s.x, f, x);

/** Sub-interval of [x0, x1] where the linear function through (x0, f0), (x1, f1) is > 0, or null. */
function positivePart(x0: number, x1: number, f0: number, f1: number): [number, number] | null {
  if (f0 <= 0 && f1 <= 0) return null;
  if (f0 > 0 && f1 > 0) return [x0, x1];
  const xr = x0 + ((x1 - x0) * f0) / (f0 - f1);
  return f0 > 0 ? [x0, xr] : [xr, x1];
}

/** The pieces of a box's x span between rail stations (within the measured station range). */
function pieces(box: PlacedWidthBox, stations: RailStation[]): Array<[number, number]> {
  if (stations.length === 0) return [];
  const lo = Math.max(box.xMin, stations[0].x);
  const hi = Math.min(box.xMax, stations[stations.length - 1].x);
  if (hi < lo) return [];
  const xs = [lo, ...stations.map((s) => s.x).filter((x) => x > lo && x < hi), hi];
  const out: Array<[number, number]> = [];
  for (let i = 0; i + 1 < xs.length; i++) out.push([xs[i], xs[i + 1]]);
  if (out.length === 0) out.push([lo, hi]);
  return out;
}

/**
 * Lateral gap of each width box to the frame rails' inside faces, only where the box and the rails overlap
 * in height. Widths and rail heights are interpolated linearly between stations, so on each piece the
 * height-overlap is an interval of x and the gap is smallest at one of its ends.
 */
export function measureRailWidth(boxes: readonly PlacedWidthBox[], railStations: readonly RailStation[], dz = 0): WidthContact | null {
  const stations = sortedStations(railStations);
  let worst: WidthContact | null = null;
  for (const box of boxes) {
    const zMin = box.zMin + dz;
    const zMax = box.zMax + dz;
    for (const [x0, x1] of pieces(box, stations)) {
      // overlap: zMin < zTop(x) and zMax > zBottom(x)
      const a = positivePart(x0, x1, at(stations, x0, (s) => s.zTop) - zMin, at(stations, x1, (s) => s.zTop) - zMin);
      if (!a) continue;
      const b = positivePart(a[0], a[1], zMax - at(stations, a[0], (s) => s.zBottom), zMax - at(stations, a[1], (s) => s.zBottom));
      if (!b) continue;
      for (const x of b) {
        const width = at(stations, x, (s) => s.insideWidthMm);
        for (const side of ['left', 'right'] as const) {
          const gap = width / 2 - (side === 'left' ? box.halfWidthLeftMm : box.halfWidthRightMm);
          if (worst === null || gap < worst.gap) {
            worst = { box, side, x, insideWidthMm: width, gap, railZBottom: at(stations, x, (s) => s.zBottom), railZTop: at(stations, x, (s) => s.zTop) };
          }
        }
      }
    }
  }
  return worst;
}

/** Engine heights (z_e offsets from the base placement) where a box is level with the rails at an x where its gap is short. */
export function railForbiddenBands(
  boxes: readonly PlacedWidthBox[],
  railStations: readonly RailStation[],
  required: number,
): Array<{ from: number; to: number; box: PlacedWidthBox }> {
  const stations = sortedStations(railStations);
  const bands: Array<{ from: number; to: number; box: PlacedWidthBox }> = [];
  for (const box of boxes) {
    const half = Math.max(box.halfWidthLeftMm, box.halfWidthRightMm);
    for (const [x0, x1] of pieces(box, stations)) {
      const short = positivePart(
        x0,
        x1,
        required - (at(stations, x0, (s) => s.insideWidthMm) / 2 - half),
        required - (at(stations, x1, (s) => s.insideWidthMm) / 2 - half),
      );
      if (!short) continue;
      const lower = Math.min(...short.map((x) => at(stations, x, (s) => s.zBottom) - box.zMax));
      const upper = Math.max(...short.map((x) => at(stations, x, (s) => s.zTop) - box.zMin));
      bands.push({ from: lower, to: upper, box });
    }
  }
  return bands;
}

export function clearFinding(fields: Omit<Finding, 'status' | 'measured' | 'margin' | 'missing' | 'remedies' | 'message' | 'required' | 'limit'>, required: number, message: string): Finding {
  return { limit: 'min', ...fields, status: 'ok', measured: null, required, margin: null, message, missing: [], remedies: [] };
}

function railRemedies(spec: CheckContext['spec'], settings: FitSettings, contact: WidthContact, target: number): Remedy[] {
  const remedies: Remedy[] = [];
  const need = target - (contact.gap - settings.minRailGapMm);
  if (contact.box.source === 'accessory-drive') {
    const placement = spec.placement;
    const others = (spec.engine.accessoryDrives ?? [])
      .filter((d) => d.id !== contact.box.id)
      .map((d) => ({ d, c: measureRailWidth([driveWidthBox(spec, d, placement)], spec.chassis.railStations) }))
      .filter((e) => !e.c || e.c.gap - settings.minRailGapMm >= target)
      .sort((a, b) => (b.c?.gap ?? Infinity) - (a.c?.gap ?? Infinity))
      .map((e) => e.d.id);
    remedies.push({
      kind: 'part',
      category: 'accessory-drive',
      requires: { maxHalfWidthMm: Math.floor((contact.insideWidthMm / 2 - settings.minRailGapMm - target) * 10) / 10 },
      partIds: others,
      note: others.length ? 'A narrower accessory drive from the engine\'s options clears the rails.' : 'No listed accessory drive is narrow enough; look for a narrower or relocated accessory bracket kit.',
    });
  } else {
    remedies.push({
      kind: 'part',
      category: 'exhaust-manifold',
      requires: { maxHalfWidthMm: Math.floor((contact.insideWidthMm / 2 - settings.minRailGapMm - target) * 10) / 10 },
      partIds: [],
      note: `${contact.box.name} needs ${mmWithInches(need)} less width on the ${contact.side}: tighter manifolds or swap headers made for this chassis.`,
    });
  }
  remedies.push({
    kind: 'fabrication',
    operation: `Relieve and plate the ${contact.side} frame rail, or re-route the part`,
    laborHours: settings.railClearanceFabricationHours,
    note: 'Welding on a frame is structural work: use a qualified welder, keep heat away from fuel and brake lines, and check local rules.',
  });
  return remedies;
}

export function runRailWidth({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: RAIL_WIDTH_ID,
    group: 'envelope' as const,
    title: 'Accessory drive and exhaust width to frame rails',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE}: hot exhaust and moving accessories near the rails (the shop's minimum clearance to the frame rails).`,
  };
  const missing: string[] = [];
  if (!spec.chassis.railStations || spec.chassis.railStations.length === 0) missing.push('chassis.railStations');
  const placed: PlacedEngine = placedForSpec(spec);
  if (placed.widthBoxes.length === 0) missing.push('engine.widthFeatures or engine.accessoryDrives');
  if (missing.length) return unknownFinding(fields, missing);
  const contact = measureRailWidth(placed.widthBoxes, spec.chassis.railStations);
  if (!contact) {
    return clearFinding(fields, settings.minRailGapMm, 'No width feature of the engine is level with the frame rails where they were measured at this placement.');
  }
  const fig = figures(contact.gap, settings.minRailGapMm, settings);
  const where = `at ${mmWithInches(contact.x)} behind the axle line, where the rails are ${mmWithInches(contact.insideWidthMm)} apart inside`;
  const message =
    contact.gap >= 0
      ? `${contact.box.name} clears the ${contact.side} frame rail by ${mmWithInches(contact.gap)} ${where}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `${contact.box.name} is ${mmWithInches(-contact.gap)} wider than the space to the ${contact.side} frame rail ${where}.`;
  const remedies = fig.status === 'ok' ? [] : railRemedies(spec, settings, contact, fig.status === 'fails' ? 0 : settings.tightBandMm);
  return measuredFinding({ ...fields, against: `frame-rail-${contact.side}` }, fig, message, remedies);
}

export const RAIL_WIDTH_CHECK: CheckDefinition = {
  id: RAIL_WIDTH_ID,
  group: 'envelope',
  title: 'Accessory drive and exhaust width to frame rails',
  dependsOnPlacement: true,
  run: runRailWidth,
  // A width feature level with a rail closer than the minimum gap forbids that band of heights.
  windowTerms: (spec, settings, base) => {
    const stations = spec.chassis.railStations;
    if (!stations?.length || !base.widthBoxes.length) return {};
    const railBound = (side: string) => ({ checkId: RAIL_WIDTH_ID, against: `frame-rail-${side}` });
    return {
      bands: railForbiddenBands(base.widthBoxes, stations, settings.minRailGapMm).map((band) => ({
        fromMm: band.from,
        toMm: band.to,
        bound: railBound(band.box.halfWidthLeftMm >= band.box.halfWidthRightMm ? 'left' : 'right'),
      })),
      marginsAt: (heightMm) => {
        const contact = measureRailWidth(base.widthBoxes, stations, heightMm);
        return contact ? [{ bound: railBound(contact.side), margin: contact.gap - settings.minRailGapMm }] : [];
      },
    };
  },
};
