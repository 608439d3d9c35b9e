import { computeFitWindow, proposePlacement, runFitCheck, type FitSettings, type FitSpec, type FitWindow, type Placement, type PlacementProposal } from '@swapwright/shared';
import type { FitReport } from '../types';

export type { FitWindow };

/** The spec with another placement, for an instant in-browser preview. */
export function withPlacement(spec: FitSpec, placement: Placement): FitSpec {
  return { ...spec, placement: { ...placement } };
}

/** Runs the same fit engine the API runs, here in the browser (preview only, nothing is stored). */
export function previewFitCheck(spec: FitSpec, placement: Placement, settings?: Partial<FitSettings>): FitReport {
  return runFitCheck(withPlacement(spec, placement), settings);
}

/** Setbacks searched either side of the saved placement. */
export const WINDOW_SPAN_MM = 200;

/** The band of crank heights where every clearance passes, over setbacks around `centerSetbackMm`, at one tilt. */
export function fitWindowFor(spec: FitSpec, centerSetbackMm: number, tiltDeg: number, settings?: Partial<FitSettings>): FitWindow {
  return computeFitWindow(
    spec,
    { setbackFromMm: centerSetbackMm - WINDOW_SPAN_MM, setbackToMm: centerSetbackMm + WINDOW_SPAN_MM, stepMm: 10, tiltDeg },
    settings ?? {},
  );
}

/** The tilt-aware best placement around the report's own setback (clearances and U-joint angles weighed together). */
export function proposalFor(spec: FitSpec, settings?: Partial<FitSettings>): PlacementProposal | null {
  return proposePlacement(spec, {}, settings ?? {});
}
