import { ENVELOPE_CHECKS } from '../checks/envelope';
import { sharedCheckContext } from '../checks/check-definition';
import { placeEngine, type PlacedEngine } from '../checks/envelope/placed-engine';
import type { WindowBound } from '../checks/envelope/window-terms';
import { goldenSectionMax } from '../geometry/golden-section';
import { findBoundary } from '../geometry/lipschitz-solve';
import { resolveFitSettings, type FitSettings } from '../settings/fit-settings';
import type { CheckStatus } from '../types/finding';
import type { FitSpec, Placement } from '../types/fit-spec';

/**
 * Fit window: for each setback (at one tilt) the crank-centreline heights where every clearance check
 * (the envelope group) passes. Mounts and the transmission mount are not part of it: they are bridged by
 * adapters, spacers or brackets rather than bounding where the engine can go.
 */

export interface FitWindowOptions {
  setbackFromMm?: number;
  setbackToMm?: number;
  stepMm?: number;
  tiltDeg?: number;
  /** Heights searched (crank centreline above the ground). */
  lowestHeightMm?: number;
  highestHeightMm?: number;
}

export type { WindowBound } from '../checks/envelope/window-terms';

export interface FitWindowInterval {
  lowMm: number;
  highMm: number;
  lowBoundBy: WindowBound;
  highBoundBy: WindowBound;
}

/** One column of the picture: at this setback the engine fits for lowMm ≤ crank height ≤ highMm. */
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
  marginAt: (heightMm: number) => number;
  /** Exact: margin = intercept + slope · height. */
  linear?: { intercept: number; slope: 1 | -1 };
}

/** A constraint's key in the warm start: the check and what it is measured against. */
const constraintKey = (bound: WindowBound): string => `${bound.checkId}|${bound.against}`;

/**
 * What one column of the window hands the next (neighbouring columns have nearly the same bounds): each
 * monotone constraint's last boundary height, and which constraints set the low and the high end.
 */
export interface WindowWarmStart {
  boundaryHeightMm: Map<string, number>;
  /** Index (in the column model's constraints) of the constraint that set the last column's low end. */
  lowSetBy?: number;
  /** Index of the constraint that set the last column's high end. */
  highSetBy?: number;
}

export function newWarmStart(): WindowWarmStart {
  return { boundaryHeightMm: new Map() };
}

export interface ColumnModel {
  constant: Array<{ bound: WindowBound; margin: number }>;
  constraints: Constraint[];
  bands: Array<{ from: number; to: number; bound: WindowBound }>;
  /** Margins of the width checks at a height (for the best placement score). */
  widthMargins: (heightMm: number) => Array<{ bound: WindowBound; margin: number }>;
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
    for (const term of terms.constraints ?? []) {
      constraints.push({ bound: term.bound, trend: term.trend, marginAt: term.marginAt, linear: term.linear });
    }
    constant.push(...(terms.constants ?? []));
    for (const band of terms.bands ?? []) bands.push({ from: band.fromMm, to: band.toMm, bound: band.bound });
    if (terms.marginsAt) marginReaders.push(terms.marginsAt);
  }
  const widthMargins = (heightMm: number): Array<{ bound: WindowBound; margin: number }> => marginReaders.flatMap((read) => read(heightMm));
  return { constant, constraints, bands, widthMargins };
}

/** Solving order: exact (linear) constraints first, then the ones that set the last column's ends, then the rest. */
function solvingRank(entry: { constraint: Constraint; index: number }, warm: WindowWarmStart): number {
  if (entry.constraint.linear) return 0;
  if (entry.index === warm.lowSetBy || entry.index === warm.highSetBy) return 1;
  return 2;
}

/** Boundary of a monotone constraint: the lowest passing height for `rises`, the highest for `falls`; ±Infinity when it never binds in range. */
function monotoneBoundary(constraint: Constraint, startMm: number, lowestMm: number, highestMm: number): number {
  const rises = constraint.trend === 'rises';
  if (constraint.linear) return rises ? -constraint.linear.intercept : constraint.linear.intercept;
  const passing = constraint.marginAt(startMm) >= 0;
  const direction: 1 | -1 = rises ? (passing ? -1 : 1) : passing ? 1 : -1;
  const travelMm = direction === 1 ? highestMm - startMm : startMm - lowestMm;
  const boundaryMm = findBoundary(constraint.marginAt, startMm, direction, { maxTravel: Math.max(travelMm, 0) + 1, tolerance: 1e-4, monotone: true });
  if (boundaryMm === null) {
    // Never met within range: passing all the way (not binding) or failing all the way (closes the column).
    if (passing) return rises ? -Infinity : Infinity;
    return rises ? Infinity : -Infinity;
  }
  return boundaryMm;
}

/** Passing sub-intervals of [fromMm, toMm] for a 1-Lipschitz margin, stepping |margin| at a time. */
function passingIntervals(marginAt: (heightMm: number) => number, fromMm: number, toMm: number, toleranceMm = 1e-4): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  const searchSpan = { maxTravel: toMm - fromMm + 1, tolerance: toleranceMm };
  let height = fromMm;
  let passingFrom: number | null = null;
  let guard = 0;
  while (height <= toMm && guard++ < 10000) {
    const margin = marginAt(height);
    if (margin >= 0) {
      if (passingFrom === null) passingFrom = height;
      // a 1-Lipschitz margin stays ≥ 0 for at least `margin` further
      const next = height + Math.max(margin, toleranceMm);
      if (next > toMm) {
        if (marginAt(toMm) >= 0) {
          out.push([passingFrom, toMm]);
          return out;
        }
        height = Math.min(next, toMm);
        const end = findBoundary(marginAt, height - Math.max(margin, toleranceMm), 1, searchSpan);
        out.push([passingFrom, end ?? height]);
        passingFrom = null;
        height = (end ?? height) + toleranceMm;
        continue;
      }
      if (marginAt(next) < 0) {
        const end = findBoundary(marginAt, height, 1, searchSpan) ?? height;
        out.push([passingFrom, end]);
        passingFrom = null;
        height = end + toleranceMm;
        continue;
      }
      height = next;
    } else {
      height += Math.max(-margin, toleranceMm);
    }
  }
  if (passingFrom !== null) out.push([passingFrom, toMm]);
  return out;
}

function subtractBands(
  intervals: FitWindowInterval[],
  bands: ColumnModel['bands'],
): FitWindowInterval[] {
  let current = intervals;
  for (const band of bands) {
    const next: FitWindowInterval[] = [];
    for (const interval of current) {
      if (band.to <= interval.lowMm || band.from >= interval.highMm) {
        next.push(interval);
        continue;
      }
      if (band.from > interval.lowMm) next.push({ ...interval, highMm: band.from, highBoundBy: band.bound });
      if (band.to < interval.highMm) next.push({ ...interval, lowMm: band.to, lowBoundBy: band.bound });
    }
    current = next;
  }
  return current;
}

export interface WindowContext {
  spec: FitSpec;
  settings: FitSettings;
  tiltDeg: number;
  /** Heights searched (crank centreline above the ground). */
  lowestMm: number;
  highestMm: number;
}

/** One column of the window. `warm` carries the last column's boundaries to the next (see {@link WindowWarmStart}). */
export function windowColumn(context: WindowContext, setbackMm: number, warm: WindowWarmStart = newWarmStart()): FitWindowColumn {
  return columnWithModel(context, setbackMm, warm).column;
}

export function columnWithModel(context: WindowContext, setbackMm: number, warm: WindowWarmStart): { column: FitWindowColumn; model: ColumnModel } {
  const base = placeEngine(context.spec, { setbackMm, heightMm: 0, tiltDeg: context.tiltDeg });
  return solveColumn(context, setbackMm, warm, buildColumn(context.spec, context.settings, base));
}

function solveColumn(context: WindowContext, setbackMm: number, warm: WindowWarmStart, model: ColumnModel): { column: FitWindowColumn; model: ColumnModel } {
  const { spec, lowestMm, highestMm } = context;
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
  for (const fixed of model.constant) if (fixed.margin < 0) return blocked(fixed.bound);
  let lowMm = lowestMm;
  let lowBy = WINDOW_RANGE;
  let highMm = highestMm;
  let highBy = WINDOW_RANGE;
  const nonMonotone: Constraint[] = [];
  // A monotone margin already ≥ 0 at the current low (high) end cannot raise (lower) it, which costs one
  // evaluation; solving the likely binding constraints first makes that skip common.
  const order = model.constraints
    .map((constraint, index) => ({ constraint, index }))
    .sort((a, b) => solvingRank(a, warm) - solvingRank(b, warm) || a.index - b.index);
  for (const { constraint, index } of order) {
    if (constraint.trend === 'any') {
      nonMonotone.push(constraint);
      continue;
    }
    if (constraint.trend === 'rises' && !constraint.linear && lowMm > lowestMm && constraint.marginAt(lowMm) >= 0) continue;
    if (constraint.trend === 'falls' && !constraint.linear && highMm < highestMm && constraint.marginAt(highMm) >= 0) continue;
    const key = constraintKey(constraint.bound);
    const startMm = Math.min(highestMm, Math.max(lowestMm, warm.boundaryHeightMm.get(key) ?? spec.placement.heightMm));
    const boundaryMm = monotoneBoundary(constraint, startMm, lowestMm, highestMm);
    if (Number.isFinite(boundaryMm)) warm.boundaryHeightMm.set(key, boundaryMm);
    if (constraint.trend === 'rises' && boundaryMm > lowMm) {
      lowMm = boundaryMm;
      lowBy = constraint.bound;
      warm.lowSetBy = index;
    }
    if (constraint.trend === 'falls' && boundaryMm < highMm) {
      highMm = boundaryMm;
      highBy = constraint.bound;
      warm.highSetBy = index;
    }
  }
  if (lowMm > highMm) return blocked(lowMm > highestMm ? lowBy : highMm < lowestMm ? highBy : lowBy);
  let intervals: FitWindowInterval[] = [{ lowMm, highMm, lowBoundBy: lowBy, highBoundBy: highBy }];
  let emptiedBy: WindowBound | null = null;
  for (const constraint of nonMonotone) {
    const next: FitWindowInterval[] = [];
    for (const interval of intervals) {
      // 1-Lipschitz: a margin of at least the interval's length at its low end holds over all of it.
      if (constraint.marginAt(interval.lowMm) >= interval.highMm - interval.lowMm) {
        next.push(interval);
        continue;
      }
      for (const [fromMm, toMm] of passingIntervals(constraint.marginAt, interval.lowMm, interval.highMm)) {
        next.push({
          lowMm: fromMm,
          highMm: toMm,
          lowBoundBy: fromMm > interval.lowMm + 1e-3 ? constraint.bound : interval.lowBoundBy,
          highBoundBy: toMm < interval.highMm - 1e-3 ? constraint.bound : interval.highBoundBy,
        });
      }
    }
    if (next.length === 0 && intervals.length > 0) emptiedBy = constraint.bound;
    intervals = next;
  }
  // Each bound is pulled 1e-6 mm inside, so rounding between the window's frame (height 0 plus z) and a check
  // placed at that height cannot turn a bound into a failure.
  intervals = subtractBands(intervals, model.bands)
    .map((interval) => ({
      ...interval,
      lowMm: interval.lowBoundBy === WINDOW_RANGE ? interval.lowMm : interval.lowMm + BOUND_INSET_MM,
      highMm: interval.highBoundBy === WINDOW_RANGE ? interval.highMm : interval.highMm - BOUND_INSET_MM,
    }))
    .filter((interval) => interval.highMm >= interval.lowMm)
    .sort((a, b) => b.highMm - b.lowMm - (a.highMm - a.lowMm));
  if (intervals.length === 0) return blocked(emptiedBy ?? model.bands[0]?.bound ?? lowBy);
  const widest = intervals[0];
  return {
    model,
    column: {
      setbackMm,
      feasible: true,
      lowMm: widest.lowMm,
      highMm: widest.highMm,
      lowBoundBy: widest.lowBoundBy,
      highBoundBy: widest.highBoundBy,
      intervals,
      blockedBy: null,
    },
  };
}

/** Smallest margin over every envelope constraint at a height (the best-placement objective). */
export function scoreAt(model: ColumnModel, heightMm: number): { score: number; by: WindowBound } {
  let score = Infinity;
  let by = WINDOW_RANGE;
  for (const fixed of model.constant) if (fixed.margin < score) ({ margin: score, bound: by } = fixed);
  for (const constraint of model.constraints) {
    const margin = constraint.marginAt(heightMm);
    if (margin < score) {
      score = margin;
      by = constraint.bound;
    }
  }
  for (const width of model.widthMargins(heightMm)) if (width.margin < score) ({ margin: score, bound: by } = width);
  return { score, by };
}

function maximiseOnInterval(model: ColumnModel, fromMm: number, toMm: number): { heightMm: number; score: number; by: WindowBound } {
  const { at: heightMm } = goldenSectionMax((height) => scoreAt(model, height).score, fromMm, toMm);
  return { heightMm, ...scoreAt(model, heightMm) };
}

/** Margins of the envelope checks at a placement, from the check functions themselves. */
export function envelopeMargins(spec: FitSpec, settings: FitSettings, placement: Placement): WindowMargin[] {
  const context = sharedCheckContext({ ...spec, placement }, settings);
  return ENVELOPE_CHECKS.map((check) => check.run(context))
    .filter((finding) => finding.margin !== null)
    .map((finding) => ({ checkId: finding.checkId, against: finding.against ?? '', marginMm: finding.margin as number, status: finding.status }));
}

/** True when checks bound the interval at both ends (neither end is the searched range's edge). */
export function boundedByChecks(interval: Pick<FitWindowInterval, 'lowBoundBy' | 'highBoundBy'>): boolean {
  return interval.lowBoundBy.checkId !== WINDOW_RANGE.checkId && interval.highBoundBy.checkId !== WINDOW_RANGE.checkId;
}

export function computeFitWindow(spec: FitSpec, options: FitWindowOptions = {}, settingsOverrides: Partial<FitSettings> = {}): FitWindow {
  const settings = resolveFitSettings(settingsOverrides);
  const tiltDeg = options.tiltDeg ?? settings.defaultTiltDeg;
  const stepMm = options.stepMm ?? 5;
  const fromMm = options.setbackFromMm ?? spec.placement.setbackMm - 150;
  const toMm = options.setbackToMm ?? spec.placement.setbackMm + 150;
  const context: WindowContext = { spec, settings, tiltDeg, lowestMm: options.lowestHeightMm ?? 0, highestMm: options.highestHeightMm ?? 2000 };
  const columns: FitWindowColumn[] = [];
  const models: ColumnModel[] = [];
  const warm = newWarmStart();
  const steps = Math.max(0, Math.floor((toMm - fromMm) / stepMm + 1e-9));
  for (let step = 0; step <= steps; step++) {
    const { column, model } = columnWithModel(context, fromMm + step * stepMm, warm);
    columns.push(column);
    models.push(model);
  }

  // Best placement: score the middle of every passing interval once, then refine the most promising few
  // by golden-section search on the smallest margin (ties: the wider interval, then the nearer setback).
  // Only intervals that checks close at both ends count: where the searched range's own edge ends one (no oil
  // pan outline below, say), the largest margin lies at that edge, and it would propose an engine on the floor.
  const candidates: Array<{ setbackMm: number; lowMm: number; highMm: number; model: ColumnModel; scoreAtMiddle: number }> = [];
  columns.forEach((column, index) => {
    if (!column.feasible) return;
    for (const interval of column.intervals.filter(boundedByChecks)) {
      const scoreAtMiddle = scoreAt(models[index], (interval.lowMm + interval.highMm) / 2).score;
      candidates.push({ setbackMm: column.setbackMm, lowMm: interval.lowMm, highMm: interval.highMm, model: models[index], scoreAtMiddle });
    }
  });
  const currentSetbackMm = spec.placement.setbackMm;
  candidates.sort(
    (a, b) =>
      b.scoreAtMiddle - a.scoreAtMiddle ||
      b.highMm - b.lowMm - (a.highMm - a.lowMm) ||
      Math.abs(a.setbackMm - currentSetbackMm) - Math.abs(b.setbackMm - currentSetbackMm),
  );
  let best: BestPlacement | null = null;
  let bestScore = -Infinity;
  for (const candidate of candidates.slice(0, 6)) {
    const refined = maximiseOnInterval(candidate.model, candidate.lowMm, candidate.highMm);
    if (refined.score > bestScore + 1e-9) {
      bestScore = refined.score;
      const placement = { setbackMm: candidate.setbackMm, heightMm: Math.round(refined.heightMm * 10) / 10, tiltDeg };
      best = { placement, smallestMarginMm: refined.score, limitedBy: refined.by, margins: [] };
    }
  }
  if (best) {
    // Rounded to 0.1 mm for the shop floor; keep it inside the window it came from.
    best.margins = envelopeMargins(spec, settings, best.placement);
    const smallest = best.margins.reduce((tightest, margin) => (margin.marginMm < tightest.marginMm ? margin : tightest), best.margins[0]);
    if (smallest) {
      best.smallestMarginMm = smallest.marginMm;
      best.limitedBy = { checkId: smallest.checkId, against: smallest.against };
    }
  }
  const checkContext = sharedCheckContext(spec, settings);
  const notChecked = ENVELOPE_CHECKS.map((c) => c.run(checkContext))
    .filter((finding) => finding.status === 'unknown')
    .map((finding) => finding.checkId);
  return { tiltDeg, stepMm, columns, best, notChecked };
}

