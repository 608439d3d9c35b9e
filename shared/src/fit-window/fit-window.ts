import { ENVELOPE_CHECKS } from '../checks/envelope';
import { placeEngine, type PlacedEngine } from '../checks/envelope/placed-engine';
import type { WindowBound } from '../checks/envelope/window-terms';
import { goldenSectionMax } from '../geometry/golden-section';
import { findBoundary } from '../geometry/lipschitz-solve';
import { resolveFitSettings, type FitSettings } from '../settings/fit-settings';
import type { CheckStatus } from '../types/finding';
import type { FitSpec, Placement } from '../types/fit-spec';

/**
 * Fit window: for each setback (at one tilt) the crank-centreline heights z_e where every clearance check
 * (the envelope group) passes. Mounts and the transmission mount are not part of it: they are bridged by
 * adapters, spacers or brackets rather than bounding where the engine can go.
 */

export interface FitWindowOptions {
  setbackFromMm?: number;
  setbackToMm?: number;
  stepMm?: number;
  tiltDeg?: number;
  /** Heights searched (crank centreline above the ground). */
  zMinMm?: number;
  zMaxMm?: number;
}

export type { WindowBound } from '../checks/envelope/window-terms';

export interface FitWindowInterval {
  lowMm: number;
  highMm: number;
  lowBoundBy: WindowBound;
  highBoundBy: WindowBound;
}

/** One column of the picture: at this setback the engine fits for lowMm ≤ z_e ≤ highMm. */
export interface FitWindowColumn {
  setbackMm: number;
  feasible: boolean;
  lowMm: number | null;
  highMm: number | null;
  lowBoundBy: WindowBound | null;
  highBoundBy: WindowBound | null;
  /** All passing intervals, widest first (usually one); low/high above are the widest. */
  intervals: FitWindowInterval[];
  /** When infeasible: the check that closes the window here. */
  blockedBy: WindowBound | null;
}

export interface WindowMargin {
  checkId: string;
  against: string;
  marginMm: number;
  status: CheckStatus;
}

export interface BestPlacement {
  placement: Placement;
  smallestMarginMm: number;
  limitedBy: WindowBound;
  /** Margins of every envelope check at the proposed placement, from the checks themselves. */
  margins: WindowMargin[];
}

export interface FitWindow {
  tiltDeg: number;
  stepMm: number;
  columns: FitWindowColumn[];
  best: BestPlacement | null;
  /** Envelope checks that could not bound the window for lack of input. */
  notChecked: string[];
}

const BOUND_INSET_MM = 1e-6;

export const WINDOW_RANGE: WindowBound = { checkId: 'window.range', against: 'searched range' };

interface Constraint {
  bound: WindowBound;
  trend: 'rises' | 'falls' | 'any';
  margin: (z: number) => number;
  /** Exact: margin = a + slope·z. */
  linear?: { a: number; slope: 1 | -1 };
}

export interface ColumnModel {
  constant: Array<{ bound: WindowBound; margin: number }>;
  constraints: Constraint[];
  bands: Array<{ from: number; to: number; bound: WindowBound }>;
  /** Margins of the width checks at a height (for the best placement score). */
  widthMargins: (z: number) => Array<{ bound: WindowBound; margin: number }>;
}

/** The column's terms, collected from every envelope check's own window terms (see window-terms.ts). */
function buildColumn(spec: FitSpec, settings: FitSettings, base: PlacedEngine): ColumnModel {
  const constant: ColumnModel['constant'] = [];
  const constraints: Constraint[] = [];
  const bands: ColumnModel['bands'] = [];
  const marginReaders: Array<(heightMm: number) => Array<{ bound: WindowBound; margin: number }>> = [];
  for (const check of ENVELOPE_CHECKS) {
    const terms = check.windowTerms?.(spec, settings, base);
    if (!terms) continue;
    for (const c of terms.constraints ?? []) {
      constraints.push({ bound: c.bound, trend: c.trend, margin: c.marginAt, linear: c.linear ? { a: c.linear.intercept, slope: c.linear.slope } : undefined });
    }
    constant.push(...(terms.constants ?? []));
    for (const band of terms.bands ?? []) bands.push({ from: band.fromMm, to: band.toMm, bound: band.bound });
    if (terms.marginsAt) marginReaders.push(terms.marginsAt);
  }
  const widthMargins = (z: number): Array<{ bound: WindowBound; margin: number }> => marginReaders.flatMap((read) => read(z));
  return { constant, constraints, bands, widthMargins };
}

function rank(e: { c: Constraint; i: number }, lastLow: number | undefined, lastHigh: number | undefined): number {
  if (e.c.linear) return 0;
  if (e.i === lastLow || e.i === lastHigh) return 1;
  return 2;
}

/** Boundary of a monotone constraint: the lowest passing z for `rises`, the highest for `falls`; ±Infinity when it never binds in range. */
function monotoneBound(c: Constraint, z0: number, zMin: number, zMax: number): number {
  const rises = c.trend === 'rises';
  if (c.linear) return rises ? -c.linear.a : c.linear.a;
  const m0 = c.margin(z0);
  const passing = m0 >= 0;
  const dir: 1 | -1 = rises ? (passing ? -1 : 1) : passing ? 1 : -1;
  const travel = dir === 1 ? zMax - z0 : z0 - zMin;
  const z = findBoundary(c.margin, z0, dir, { maxTravel: Math.max(travel, 0) + 1, tolerance: 1e-4, monotone: true });
  if (z === null) {
    // Never met within range: passing all the way (not binding) or failing all the way (closes the column).
    if (passing) return rises ? -Infinity : Infinity;
    return rises ? Infinity : -Infinity;
  }
  return z;
}

/** Passing sub-intervals of [lo, hi] for a 1-Lipschitz margin, by stepping |m| at a time. */
function passingIntervals(m: (z: number) => number, lo: number, hi: number, tol = 1e-4): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  let z = lo;
  let start: number | null = null;
  let guard = 0;
  while (z <= hi && guard++ < 10000) {
    const v = m(z);
    if (v >= 0) {
      if (start === null) start = z;
      const next = z + Math.max(v, tol);
      if (next > hi) {
        if (m(hi) >= 0) {
          out.push([start, hi]);
          return out;
        }
        z = Math.min(next, hi);
        const end = findBoundary(m, z - Math.max(v, tol), 1, { maxTravel: hi - lo + 1, tolerance: tol });
        out.push([start, end ?? z]);
        start = null;
        z = (end ?? z) + tol;
        continue;
      }
      if (m(next) < 0) {
        const end = findBoundary(m, z, 1, { maxTravel: hi - lo + 1, tolerance: tol }) ?? z;
        out.push([start, end]);
        start = null;
        z = end + tol;
        continue;
      }
      z = next;
    } else {
      z += Math.max(-v, tol);
    }
  }
  if (start !== null) out.push([start, hi]);
  return out;
}

function subtractBands(
  intervals: FitWindowInterval[],
  bands: ColumnModel['bands'],
): FitWindowInterval[] {
  let current = intervals;
  for (const band of bands) {
    const next: FitWindowInterval[] = [];
    for (const iv of current) {
      if (band.to <= iv.lowMm || band.from >= iv.highMm) {
        next.push(iv);
        continue;
      }
      if (band.from > iv.lowMm) next.push({ ...iv, highMm: band.from, highBoundBy: band.bound });
      if (band.to < iv.highMm) next.push({ ...iv, lowMm: band.to, lowBoundBy: band.bound });
    }
    current = next;
  }
  return current;
}

export interface WindowContext {
  spec: FitSpec;
  settings: FitSettings;
  tiltDeg: number;
  zMin: number;
  zMax: number;
}

/** One column of the window. `warm` carries each monotone constraint's last bound between columns. */
export function windowColumn(ctx: WindowContext, setbackMm: number, warm: Map<string, number> = new Map()): FitWindowColumn {
  return columnWithModel(ctx, setbackMm, warm).column;
}

export function columnWithModel(ctx: WindowContext, setbackMm: number, warm: Map<string, number>): { column: FitWindowColumn; model: ColumnModel } {
  const column = solveColumn(ctx, setbackMm, warm, buildColumn(ctx.spec, ctx.settings, placeEngine(ctx.spec, { setbackMm, heightMm: 0, tiltDeg: ctx.tiltDeg })));
  return column;
}

function solveColumn(ctx: WindowContext, setbackMm: number, warm: Map<string, number>, model: ColumnModel): { column: FitWindowColumn; model: ColumnModel } {
  const { spec, zMin, zMax } = ctx;
  const blocked = (bound: WindowBound): { column: FitWindowColumn; model: ColumnModel } => ({ model, column: {
    setbackMm,
    feasible: false,
    lowMm: null,
    highMm: null,
    lowBoundBy: null,
    highBoundBy: null,
    intervals: [],
    blockedBy: bound,
  } });
  for (const c of model.constant) if (c.margin < 0) return blocked(c.bound);
  let low = zMin;
  let lowBy = WINDOW_RANGE;
  let high = zMax;
  let highBy = WINDOW_RANGE;
  const general: Constraint[] = [];
  // Exact (linear) bounds first, then the constraint that bound the previous column, then the rest: a
  // monotone margin already ≥ 0 at the current low (high) cannot raise (lower) it, which costs one evaluation.
  const lastLow = warm.get('|low');
  const lastHigh = warm.get('|high');
  const order = model.constraints
    .map((c, i) => ({ c, i, key: `${c.bound.checkId}|${c.bound.against}` }))
    .sort((a, b) => rank(a, lastLow, lastHigh) - rank(b, lastLow, lastHigh) || a.i - b.i);
  for (const { c, key, i } of order) {
    if (c.trend === 'any') {
      general.push(c);
      continue;
    }
    if (c.trend === 'rises' && !c.linear && low > zMin && c.margin(low) >= 0) continue;
    if (c.trend === 'falls' && !c.linear && high < zMax && c.margin(high) >= 0) continue;
    const z0 = Math.min(zMax, Math.max(zMin, warm.get(key) ?? spec.placement.heightMm));
    const b = monotoneBound(c, z0, zMin, zMax);
    if (Number.isFinite(b)) warm.set(key, b);
    if (c.trend === 'rises' && b > low) {
      low = b;
      lowBy = c.bound;
      warm.set('|low', i);
    }
    if (c.trend === 'falls' && b < high) {
      high = b;
      highBy = c.bound;
      warm.set('|high', i);
    }
  }
  if (low > high) return blocked(low > zMax ? lowBy : high < zMin ? highBy : lowBy);
  let intervals: FitWindowInterval[] = [{ lowMm: low, highMm: high, lowBoundBy: lowBy, highBoundBy: highBy }];
  let emptiedBy: WindowBound | null = null;
  for (const c of general) {
    const next: FitWindowInterval[] = [];
    for (const iv of intervals) {
      // 1-Lipschitz: a margin of at least the interval's length at its low end holds over all of it.
      if (c.margin(iv.lowMm) >= iv.highMm - iv.lowMm) {
        next.push(iv);
        continue;
      }
      for (const [a, b] of passingIntervals(c.margin, iv.lowMm, iv.highMm)) {
        next.push({
          lowMm: a,
          highMm: b,
          lowBoundBy: a > iv.lowMm + 1e-3 ? c.bound : iv.lowBoundBy,
          highBoundBy: b < iv.highMm - 1e-3 ? c.bound : iv.highBoundBy,
        });
      }
    }
    if (next.length === 0 && intervals.length > 0) emptiedBy = c.bound;
    intervals = next;
  }
  // Each bound is pulled 1e-6 mm inside, so rounding between the window's frame (height 0 plus z) and a check
  // placed at that height cannot turn a bound into a failure.
  intervals = subtractBands(intervals, model.bands)
    .map((iv) => ({
      ...iv,
      lowMm: iv.lowBoundBy === WINDOW_RANGE ? iv.lowMm : iv.lowMm + BOUND_INSET_MM,
      highMm: iv.highBoundBy === WINDOW_RANGE ? iv.highMm : iv.highMm - BOUND_INSET_MM,
    }))
    .filter((iv) => iv.highMm >= iv.lowMm)
    .sort((a, b) => b.highMm - b.lowMm - (a.highMm - a.lowMm));
  if (intervals.length === 0) return blocked(emptiedBy ?? model.bands[0]?.bound ?? lowBy);
  const w = intervals[0];
  return {
    model,
    column: { setbackMm, feasible: true, lowMm: w.lowMm, highMm: w.highMm, lowBoundBy: w.lowBoundBy, highBoundBy: w.highBoundBy, intervals, blockedBy: null },
  };
}

/** Smallest margin over every envelope constraint at a height (the best-placement objective). */
export function scoreAt(model: ColumnModel, z: number): { score: number; by: WindowBound } {
  let score = Infinity;
  let by = WINDOW_RANGE;
  for (const c of model.constant) if (c.margin < score) ({ margin: score, bound: by } = c);
  for (const c of model.constraints) {
    const m = c.margin(z);
    if (m < score) {
      score = m;
      by = c.bound;
    }
  }
  for (const c of model.widthMargins(z)) if (c.margin < score) ({ margin: score, bound: by } = c);
  return { score, by };
}

function maximiseOnInterval(model: ColumnModel, lo: number, hi: number): { z: number; score: number; by: WindowBound } {
  const { z } = goldenSectionMax((height) => scoreAt(model, height).score, lo, hi);
  return { z, ...scoreAt(model, z) };
}

/** Margins of the envelope checks at a placement, from the check functions themselves. */
export function envelopeMargins(spec: FitSpec, settings: FitSettings, placement: Placement): WindowMargin[] {
  const placed = { ...spec, placement };
  return ENVELOPE_CHECKS.map((check) => check.run({ spec: placed, settings }))
    .filter((f) => f.margin !== null)
    .map((f) => ({ checkId: f.checkId, against: f.against ?? '', marginMm: f.margin as number, status: f.status }));
}

export function computeFitWindow(spec: FitSpec, options: FitWindowOptions = {}, settingsOverrides: Partial<FitSettings> = {}): FitWindow {
  const settings = resolveFitSettings(settingsOverrides);
  const tiltDeg = options.tiltDeg ?? settings.defaultTiltDeg;
  const stepMm = options.stepMm ?? 5;
  const from = options.setbackFromMm ?? spec.placement.setbackMm - 150;
  const to = options.setbackToMm ?? spec.placement.setbackMm + 150;
  const ctx: WindowContext = { spec, settings, tiltDeg, zMin: options.zMinMm ?? 0, zMax: options.zMaxMm ?? 2000 };
  const columns: FitWindowColumn[] = [];
  const models: ColumnModel[] = [];
  const warm = new Map<string, number>();
  const n = Math.max(0, Math.floor((to - from) / stepMm + 1e-9));
  for (let i = 0; i <= n; i++) {
    const { column, model } = columnWithModel(ctx, from + i * stepMm, warm);
    columns.push(column);
    models.push(model);
  }

  // Best placement: score the middle of every passing interval once, then refine the most promising few
  // by golden-section search on the smallest margin (ties: the wider interval, then the nearer setback).
  const candidates: Array<{ setbackMm: number; lo: number; hi: number; model: ColumnModel; mid: number }> = [];
  for (let i = 0; i < columns.length; i++) {
    const col = columns[i];
    if (!col.feasible) continue;
    for (const iv of col.intervals) {
      candidates.push({ setbackMm: col.setbackMm, lo: iv.lowMm, hi: iv.highMm, model: models[i], mid: scoreAt(models[i], (iv.lowMm + iv.highMm) / 2).score });
    }
  }
  const here = spec.placement.setbackMm;
  candidates.sort(
    (a, b) => b.mid - a.mid || b.hi - b.lo - (a.hi - a.lo) || Math.abs(a.setbackMm - here) - Math.abs(b.setbackMm - here),
  );
  let best: BestPlacement | null = null;
  let bestScore = -Infinity;
  for (const cand of candidates.slice(0, 6)) {
    const r = maximiseOnInterval(cand.model, cand.lo, cand.hi);
    if (r.score > bestScore + 1e-9) {
      bestScore = r.score;
      const placement = { setbackMm: cand.setbackMm, heightMm: Math.round(r.z * 10) / 10, tiltDeg };
      best = { placement, smallestMarginMm: r.score, limitedBy: r.by, margins: [] };
    }
  }
  if (best) {
    // Rounded to 0.1 mm for the shop floor; keep it inside the window it came from.
    best.margins = envelopeMargins(spec, settings, best.placement);
    const smallest = best.margins.reduce((m, x) => (x.marginMm < m.marginMm ? x : m), best.margins[0]);
    if (smallest) {
      best.smallestMarginMm = smallest.marginMm;
      best.limitedBy = { checkId: smallest.checkId, against: smallest.against };
    }
  }
  const notChecked = ENVELOPE_CHECKS.map((c) => c.run({ spec, settings }))
    .filter((f) => f.status === 'unknown')
    .map((f) => f.checkId);
  return { tiltDeg, stepMm, columns, best, notChecked };
}

