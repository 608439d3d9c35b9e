import type { FitSettings } from '../../settings/fit-settings';
import type { Finding, Remedy } from '../../types/finding';
import type { ChassisObstacle, FitSpec, OilPanSpec, Placement } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import {
  COMMON_PRACTICE,
  describeHeightChange,
  describeSetbackChange,
  figures,
  placementRemedy,
  solvePlacementChange,
  worstGap,
  type ObstacleGap,
} from './envelope-common';
import { lowestPoint, obstaclesOfKinds, placedForSpec, placeEngine, placePan } from './placed-engine';
import { measureHood } from './hood';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';
import { outlineGapValue } from '../../geometry/outline-gap';

/** The obstacle kinds below the pan, one check each. */
export const PAN_OBSTACLE_KINDS = {
  crossmember: ['crossmember'],
  steering: ['steering-linkage'],
  axle: ['axle-at-bump', 'differential-at-bump'],
} as const satisfies Record<string, readonly ChassisObstacle['kind'][]>;

export const ALL_BELOW_KINDS: ChassisObstacle['kind'][] = [
  ...PAN_OBSTACLE_KINDS.crossmember,
  ...PAN_OBSTACLE_KINDS.steering,
  ...PAN_OBSTACLE_KINDS.axle,
];

export const PAN_GAP_SOURCE = `${COMMON_PRACTICE}: half an inch under the pan, since the engine rocks on its mounts under torque (the shop's minimum clearance below the engine).`;

/** Smallest pan gap to the obstacles of the given kinds at a placement (the pan is placed here). */
export function measurePanGap(
  spec: FitSpec,
  pan: OilPanSpec,
  kinds: readonly ChassisObstacle['kind'][],
  placement: Placement = spec.placement,
): ObstacleGap | null {
  return worstGap(placePan(pan, placement), true, obstaclesOfKinds(spec, kinds));
}

export interface PanCandidateResult {
  pan: OilPanSpec;
  /** Margin against each below-pan rule in the same placement, and the smallest of them. */
  thisCheckMargin: number;
  smallestMargin: number;
}

/**
 * Evaluates candidate pans (same rail pattern as the engine) in the current placement against every rule
 * below the engine: crossmember, steering, axle and ground clearance. Only pans that pass all of them and
 * clear this check are returned, best first (largest smallest margin).
 */
export function evaluateCandidatePans(
  spec: FitSpec,
  settings: FitSettings,
  kinds: readonly ChassisObstacle['kind'][],
): PanCandidateResult[] {
  const pattern = spec.engine.panRail.pattern;
  const out: PanCandidateResult[] = [];
  for (const pan of spec.candidates?.oilPans ?? []) {
    if (pan.railPattern !== pattern || pan.id === spec.oilPan?.id) continue;
    const placedPan = placePan(pan, spec.placement);
    let thisCheckMargin = Infinity;
    let smallest = Infinity;
    for (const group of [PAN_OBSTACLE_KINDS.crossmember, PAN_OBSTACLE_KINDS.steering, PAN_OBSTACLE_KINDS.axle]) {
      const gap = worstGap(placedPan, true, obstaclesOfKinds(spec, group));
      if (!gap) continue;
      const margin = gap.result.gap - settings.minGapBelowMm;
      smallest = Math.min(smallest, margin);
      if (group.some((k) => kinds.includes(k))) thisCheckMargin = margin;
    }
    const low = lowestPoint(placeEngine(spec, spec.placement, pan), 0, spec.chassis);
    if (low) smallest = Math.min(smallest, low.clearanceMm - settings.minGroundClearanceMm);
    if (thisCheckMargin >= 0 && smallest >= 0) out.push({ pan, thisCheckMargin, smallestMargin: smallest });
  }
  return out.sort((a, b) => b.smallestMargin - a.smallestMargin);
}

export interface PanCheckConfig {
  id: string;
  title: string;
  kinds: readonly ChassisObstacle['kind'][];
  /** How the obstacle reads in a sentence, e.g. "the front crossmember". */
  label: string;
  fabrication: (settings: FitSettings) => { operation: string; laborHours: number; note: string };
}

function sumpNeeded(spec: FitSpec, obstacle: ChassisObstacle, best: OilPanSpec | undefined): OilPanSpec['sumpPosition'] {
  if (best) return best.sumpPosition;
  const pan = spec.oilPan;
  if (!pan) return 'rear';
  const placed = placePan(pan, spec.placement);
  const panMidX = (Math.min(...placed.map((p) => p.x)) + Math.max(...placed.map((p) => p.x))) / 2;
  const obstacleMidX = obstacle.outline.reduce((s, p) => s + p.x, 0) / obstacle.outline.length;
  // x grows rearward: an obstacle ahead of the middle of the pan wants the sump behind it.
  return obstacleMidX < panMidX ? 'rear' : 'front';
}

export function panRemedies(spec: FitSpec, settings: FitSettings, config: PanCheckConfig, worst: ObstacleGap, failing: boolean): Remedy[] {
  const remedies: Remedy[] = [];
  const pan = spec.oilPan as OilPanSpec;
  const required = settings.minGapBelowMm;
  // A failing check is brought to the limit; a tight one to the edge of the tight band.
  const target = failing ? 0 : settings.tightBandMm;
  const candidates = evaluateCandidatePans(spec, settings, config.kinds);
  const sumpPosition = sumpNeeded(spec, worst.obstacle, candidates[0]?.pan);
  remedies.push({
    kind: 'part',
    category: 'oil-pan',
    requires: { sumpPosition, railPattern: spec.engine.panRail.pattern },
    partIds: candidates.map((c) => c.pan.id),
    note: candidates.length
      ? `A ${sumpPosition}-sump pan that bolts to this engine's block clears ${config.label} in this placement: ` +
        candidates.map((c) => `${c.pan.name} by ${mmWithInches(c.thisCheckMargin + required)}`).join('; ') +
        '. Fit the matching pickup and check the dipstick.'
      : `No candidate pan clears ${config.label} in this placement; look for a ${sumpPosition}-sump pan that bolts to this engine's block.`,
  });
  const marginAt = (p: Placement): number => {
    const g = worstGap(placePan(pan, p), true, [worst.obstacle]);
    return (g ? g.result.gap : Infinity) - required - target;
  };
  const raise = solvePlacementChange(spec.placement, 'height', 1, marginAt, 400);
  if (raise !== null) {
    const hood = measureHood(placeEngine(spec, { ...spec.placement, heightMm: spec.placement.heightMm + raise }), spec.chassis.hoodLine);
    const hoodNote = hood
      ? hood.clearance - settings.minHoodGapMm >= 0
        ? ` The hood still clears by ${mmWithInches(hood.clearance)} there.`
        : ` The hood would then be short by ${mmWithInches(settings.minHoodGapMm - hood.clearance)}.`
      : '';
    remedies.push(placementRemedy('height', raise, `${describeHeightChange(raise)} to clear ${config.label} by ${mmWithInches(required + target)}.${hoodNote}`));
  }
  const back = solvePlacementChange(spec.placement, 'setback', 1, marginAt, 300);
  const forward = solvePlacementChange(spec.placement, 'setback', -1, marginAt, 300);
  const shift = back !== null && (forward === null || Math.abs(back) <= Math.abs(forward)) ? back : forward;
  if (shift !== null) {
    remedies.push(
      placementRemedy('setback', shift, `${describeSetbackChange(shift)} so the pan clears ${config.label} by ${mmWithInches(required + target)}; recheck the firewall, driveshaft and mounts.`),
    );
  }
  const fab = config.fabrication(settings);
  remedies.push({ kind: 'fabrication', operation: fab.operation, laborHours: fab.laborHours, note: fab.note });
  return remedies;
}

export function runPanCheck(context: CheckContext, config: PanCheckConfig): Finding {
  const { spec, settings } = context;
  const fields = { checkId: config.id, group: 'envelope' as const, title: config.title, unit: 'mm' as const, thresholdSource: PAN_GAP_SOURCE };
  const missing: string[] = [];
  if (!spec.oilPan || spec.oilPan.bottomProfile.length < 3) missing.push('oilPan.bottomProfile');
  const obstacles = obstaclesOfKinds(spec, config.kinds);
  if (obstacles.length === 0) missing.push(`chassis.obstacles (kind ${config.kinds.join(' or ')})`);
  if (missing.length) return unknownFinding(fields, missing);
  const placed = placedForSpec(spec);
  const worst = worstGap(placed.pan!, true, obstacles) as ObstacleGap;
  const gap = worst.result.gap;
  const fig = figures(gap, settings.minGapBelowMm, settings);
  const name = `${config.label} (${worst.obstacle.name})`;
  const message =
    gap >= 0
      ? `The oil pan clears ${name} by ${mmWithInches(gap)}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The oil pan runs ${mmWithInches(-gap)} into ${name}: it would have to rise ${mmWithInches(-gap)} just to touch free and ${mmWithInches(-fig.margin)} to leave the required ${mmWithInches(fig.required)}.`;
  const remedies = fig.status === 'ok' ? [] : panRemedies(spec, settings, config, worst, fig.status === 'fails');
  return measuredFinding({ ...fields, against: worst.obstacle.id }, fig, message, remedies);
}

/** A pan check states which obstacle kinds it measures against, so drawings dimension the same obstacles. */
export interface PanCheckDefinition extends CheckDefinition {
  obstacleKinds: readonly ChassisObstacle['kind'][];
}

export function panCheck(config: PanCheckConfig): PanCheckDefinition {
  return {
    id: config.id,
    obstacleKinds: config.kinds,
    group: 'envelope',
    title: config.title,
    dependsOnPlacement: true,
    run: (context) => runPanCheck(context, config),
    // The pan must keep the minimum gap above each obstacle of its kinds; the gap grows as the engine rises.
    windowTerms: (spec, settings, base) => {
      const pan = base.pan;
      if (!pan) return {};
      return {
        constraints: obstaclesOfKinds(spec, config.kinds).map((obstacle) => ({
          bound: { checkId: config.id, against: obstacle.id },
          trend: 'rises' as const,
          marginAt: (heightMm: number) => outlineGapValue(pan, true, obstacle.outline, heightMm) - settings.minGapBelowMm,
        })),
      };
    },
  };
}
