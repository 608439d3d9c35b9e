import { outlineGapToward, type GapResult, type SeparationDirection } from '../../geometry/outline-gap';
import { findBoundary } from '../../geometry/lipschitz-solve';
import type { FitSettings } from '../../settings/fit-settings';
import type { CheckStatus, PlacementRemedy } from '../../types/finding';
import type { ChassisObstacle, ChassisPoint, Placement } from '../../types/fit-spec';
import { statusFromMargin } from '../check-definition';
import { mmWithInches } from '../../units/figure-format';

export const COMMON_PRACTICE = 'Common practice (no published source)';

export interface ObstacleGap {
  obstacle: ChassisObstacle;
  result: GapResult;
}

/** The smallest gap from an engine outline (shifted up by dz) to any of the obstacles. */
export function worstGap(
  outline: readonly ChassisPoint[],
  closed: boolean,
  obstacles: readonly ChassisObstacle[],
  dz = 0,
  direction: SeparationDirection = 'up',
): ObstacleGap | null {
  let worst: ObstacleGap | null = null;
  for (const obstacle of obstacles) {
    const result = outlineGapToward(outline, closed, obstacle.outline, dz, direction);
    if (worst === null || result.gap < worst.result.gap) worst = { obstacle, result };
  }
  return worst;
}

export function figures(measured: number, required: number, settings: FitSettings): {
  measured: number;
  required: number;
  margin: number;
  status: CheckStatus;
} {
  const margin = measured - required;
  return { measured, required, margin, status: statusFromMargin(margin, settings.tightBandMm) };
}

/**
 * The smallest change along one placement axis after which `margin(placement)` is ≥ 0, searching in
 * `direction` up to maxTravel mm. The margins used here are distances, which change by at most the move.
 */
export function solvePlacementChange(
  placement: Placement,
  axis: 'setback' | 'height',
  direction: 1 | -1,
  margin: (p: Placement) => number,
  maxTravel = 300,
): number | null {
  const at = (v: number): Placement => (axis === 'setback' ? { ...placement, setbackMm: v } : { ...placement, heightMm: v });
  const start = axis === 'setback' ? placement.setbackMm : placement.heightMm;
  const z = findBoundary((v) => margin(at(v)), start, direction, { maxTravel, tolerance: 1e-4 });
  if (z === null) return null;
  // Rounded up to 0.1 mm (never short of the need), ignoring the solver's last 0.001 mm.
  return (Math.ceil(Math.abs(z - start) * 10 - 1e-3) / 10) * direction;
}

export function placementRemedy(axis: PlacementRemedy['axis'], changeBy: number, note: string): PlacementRemedy {
  return { kind: 'placement', axis, changeBy: Math.round(changeBy * 10) / 10, unit: axis === 'tilt' ? 'deg' : 'mm', note };
}

export function describeHeightChange(changeBy: number): string {
  return changeBy >= 0 ? `Raise the engine ${mmWithInches(changeBy)}` : `Lower the engine ${mmWithInches(-changeBy)}`;
}

export function describeSetbackChange(changeBy: number): string {
  return changeBy >= 0 ? `Set the engine back ${mmWithInches(changeBy)}` : `Move the engine forward ${mmWithInches(-changeBy)}`;
}
