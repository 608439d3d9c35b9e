import type { FitSettings } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import type { PlacedEngine } from './placed-engine';

/**
 * How an envelope check bounds the fit window. Each check states its own terms beside its pass/fail rule, in
 * the same file and from the same threshold, and the window solves over all of them: a rule or a threshold
 * changes in one place. Heights are the engine's crank-centreline height z above the column's base placement
 * (the outlines in `base` are placed at height 0).
 */

/** What sets a bound: a check and the obstacle, or the end of the searched range. */
export interface WindowBound {
  checkId: string;
  against: string;
}

/** A margin that depends on the engine's height (mm; negative fails). */
export interface HeightConstraint {
  bound: WindowBound;
  /** `rises`: the margin grows as the engine rises (obstacles below); `falls`: it shrinks; `any`: neither. */
  trend: 'rises' | 'falls' | 'any';
  marginAt: (heightMm: number) => number;
  /** Exact when known: margin = intercept + slope·height. */
  linear?: { intercept: number; slope: 1 | -1 };
}

/** A margin that does not depend on height (e.g. the fan to the radiator core). */
export interface ConstantMargin {
  bound: WindowBound;
  margin: number;
}

/** A band of heights where the check fails (width checks: a feature level with a rail or the steering box). */
export interface ForbiddenBand {
  fromMm: number;
  toMm: number;
  bound: WindowBound;
}

export interface WindowTerms {
  constraints?: HeightConstraint[];
  constants?: ConstantMargin[];
  bands?: ForbiddenBand[];
  /** The check's margin at a height, for scoring a placement (width checks, which bound by bands). */
  marginsAt?: (heightMm: number) => ConstantMargin[];
}

/** A check's window terms for one setback column. */
export type WindowTermsOf = (spec: FitSpec, settings: FitSettings, base: PlacedEngine) => WindowTerms;
