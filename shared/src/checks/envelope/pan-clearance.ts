import type { FitSettings } from '../../settings/fit-settings';
import type { FabricationOperationCode, Finding, Remedy } from '../../types/finding';
import type { ChassisObstacle, ChassisPoint, FitSpec, OilPanSpec, Placement } from '../../types/fit-spec';
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
import { GROUND_CLEARANCE_ID, PAN_OBSTACLE_KINDS, PAN_RULES, type PanObstacleRule } from './pan-rules';
import { measureHood } from './hood';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';
import { outlineGapValue } from '../../geometry/outline-gap';

export { PAN_OBSTACLE_KINDS, PAN_RULES, type PanObstacleRule } from './pan-rules';

export const ALL_BELOW_KINDS: ChassisObstacle['kind'][] = [
  ...PAN_OBSTACLE_KINDS.crossmember,
  ...PAN_OBSTACLE_KINDS.steering,
  ...PAN_OBSTACLE_KINDS.axle,
];

export const PAN_GAP_SOURCE = `${COMMON_PRACTICE}: half an inch under the pan, since the engine rocks on its mounts under torque (the shop's minimum clearance below the engine).`;

/**
 * The gap from a placed pan to the obstacles of the given kinds (the worst of them): the one measure the below-pan
 * checks report and every candidate pan is judged by, so a pan offered as a remedy never fails the check itself.
 */
export function panObstacleGap(spec: FitSpec, placedPan: readonly ChassisPoint[], kinds: readonly ChassisObstacle['kind'][]): ObstacleGap | null {
  return worstGap(placedPan, true, obstaclesOfKinds(spec, kinds));
}

/** Smallest pan gap to the obstacles of the given kinds at a placement (the pan is placed here). */
export function measurePanGap(
  spec: FitSpec,
  pan: OilPanSpec,
  kinds: readonly ChassisObstacle['kind'][],
  placement: Placement = spec.placement,
): ObstacleGap | null {
  return panObstacleGap(spec, placePan(pan, placement), kinds);
}

/** A pan measured against one rule below the engine, as that rule's check measures it. */
export interface PanRuleResult {
  /** The check that holds the rule: a below-pan check or the ground clearance. */
  checkId: string;
  /** How the obstacle reads in a sentence ("the front crossmember", "the ground"). */
  label: string;
  /** The obstacle's id, or `ground`. */
  against: string;
  gapMm: number;
  requiredMm: number;
  /** gap − required: negative fails the check. */
  marginMm: number;
}

/** A pan judged at a placement against every rule below the engine. */
export interface PanJudgement {
  pan: OilPanSpec;
  /** The below-pan checks that have obstacles, front to back, then the ground clearance. */
  rules: PanRuleResult[];
  /** The smallest margin of them (Infinity when nothing could be measured). */
  smallestMargin: number;
  /** The rule it misses by the most, or null when it keeps every one. */
  failing: PanRuleResult | null;
}

function ruleResult(checkId: string, label: string, against: string, gapMm: number, requiredMm: number): PanRuleResult {
  return { checkId, label, against, gapMm, requiredMm, marginMm: gapMm - requiredMm };
}

/**
 * Judges a pan at a placement (the spec's own by default) by the measures of the checks themselves: the pan's gap to
 * the crossmember, the steering linkage and the axle at bump ({@link panObstacleGap}, against the shop's minimum gap
 * below the engine), and the lowest point above the ground (against the minimum ground clearance).
 */
export function judgePan(spec: FitSpec, settings: FitSettings, pan: OilPanSpec, placement: Placement = spec.placement): PanJudgement {
  const placed = placeEngine(spec, placement, pan);
  const rules: PanRuleResult[] = [];
  for (const rule of Object.values(PAN_RULES)) {
    const gap = panObstacleGap(spec, placed.pan!, rule.kinds);
    if (gap) rules.push(ruleResult(rule.id, rule.label, gap.obstacle.id, gap.result.gap, settings.minGapBelowMm));
  }
  const low = lowestPoint(placed, 0, spec.chassis);
  if (low) rules.push(ruleResult(GROUND_CLEARANCE_ID, 'the ground', 'ground', low.clearanceMm, settings.minGroundClearanceMm));
  const tightest = rules.reduce<PanRuleResult | null>((min, rule) => (min === null || rule.marginMm < min.marginMm ? rule : min), null);
  return { pan, rules, smallestMargin: tightest?.marginMm ?? Infinity, failing: tightest && tightest.marginMm < 0 ? tightest : null };
}

/**
 * The candidate pans that bolt to this engine's block (the fitted one aside) and that `accept` lets through, each
 * judged in the spec's placement (see {@link judgePan}), in the candidates' order. A pan already judged in this run
 * (the context's `judgedPans`) is not placed and measured again.
 */
export function judgeCandidatePans({ spec, settings, judgedPans }: CheckContext, accept: (pan: OilPanSpec) => boolean = () => true): PanJudgement[] {
  const pattern = spec.engine.panRail.pattern;
  const judge = (pan: OilPanSpec): PanJudgement => {
    const known = judgedPans?.get(pan.id);
    if (known) return known;
    const judged = judgePan(spec, settings, pan);
    judgedPans?.set(pan.id, judged);
    return judged;
  };
  return (spec.candidates?.oilPans ?? []).filter((pan) => pan.railPattern === pattern && pan.id !== spec.oilPan?.id && accept(pan)).map(judge);
}

/** The judged pans that keep every rule below the engine, best first (largest smallest margin). */
export function pansThatClear(judged: readonly PanJudgement[]): PanJudgement[] {
  return judged.filter((j) => !j.failing).sort((a, b) => b.smallestMargin - a.smallestMargin);
}

/** "the Trailhand TR-4410 rear-sump swap pan, which clears the front crossmember by 51.2 mm (2.02 in)": a kept pan and its tightest rule. */
export function keptPanWords(judged: PanJudgement): string {
  const tightest = judged.rules.find((rule) => rule.marginMm === judged.smallestMargin);
  return tightest ? `${judged.pan.name}, which clears ${tightest.label} by ${mmWithInches(tightest.gapMm)}` : judged.pan.name;
}

/** How a pan misses a rule: "runs 53.8 mm (2.12 in) into the front crossmember", "clears the ground by only …". */
export function panMissWords(rule: PanRuleResult): string {
  return rule.gapMm < 0
    ? `runs ${mmWithInches(-rule.gapMm)} into ${rule.label}`
    : `clears ${rule.label} by only ${mmWithInches(rule.gapMm)} of the ${mmWithInches(rule.requiredMm)} required`;
}

/** Why a judged pan was left out: "the X runs 53.8 mm (2.12 in) into the front crossmember". */
export function leftOutPanWords(judged: PanJudgement): string {
  return judged.failing ? `${judged.pan.name} ${panMissWords(judged.failing)}` : judged.pan.name;
}

/**
 * The candidate pans (by id) that would fail a rule below the engine in the spec's placement, each with the reason
 * ("runs 53.8 mm (2.12 in) into the front crossmember at this placement"): what a parts plan must not pick, not even
 * to make the pan agree with a pickup.
 */
export function panClearanceRefusals(spec: FitSpec, settings: FitSettings): Record<string, string> {
  const refusals: Record<string, string> = {};
  for (const judged of judgeCandidatePans({ spec, settings })) {
    if (judged.failing) refusals[judged.pan.id] = `${panMissWords(judged.failing)} at this placement`;
  }
  return refusals;
}

/** The sentence that names each judged pan that fails a rule below the engine and why ('' when none does). */
export function leftOutPansSentence(judged: readonly PanJudgement[]): string {
  const out = judged.filter((j) => j.failing);
  return out.length ? ` Left out at this placement: ${out.map(leftOutPanWords).join('; ')}.` : '';
}

export interface PanCandidateResult {
  pan: OilPanSpec;
  /** Margin against each below-pan rule in the same placement, and the smallest of them. */
  thisCheckMargin: number;
  smallestMargin: number;
}

/** The judged pans that keep every rule below the engine, best first (largest smallest margin), with the margin of the check of `kinds`. */
function clearingPans(judged: readonly PanJudgement[], kinds: readonly ChassisObstacle['kind'][]): PanCandidateResult[] {
  const rule = Object.values(PAN_RULES).find((r) => r.kinds.some((kind) => kinds.includes(kind)));
  return pansThatClear(judged).map((j) => ({
    pan: j.pan,
    thisCheckMargin: j.rules.find((r) => r.checkId === rule?.id)?.marginMm ?? Infinity,
    smallestMargin: j.smallestMargin,
  }));
}

/**
 * Evaluates candidate pans (same rail pattern as the engine) in the current placement against every rule
 * below the engine: crossmember, steering, axle and ground clearance. Only pans that pass all of them and
 * clear this check are returned, best first (largest smallest margin).
 */
export function evaluateCandidatePans(context: CheckContext, kinds: readonly ChassisObstacle['kind'][]): PanCandidateResult[] {
  return clearingPans(judgeCandidatePans(context), kinds);
}

export interface PanCheckConfig extends PanObstacleRule {
  title: string;
  fabrication: (settings: FitSettings) => { operation: string; laborHours: number; note: string; operationCode?: FabricationOperationCode };
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

export function panRemedies(context: CheckContext, config: PanCheckConfig, worst: ObstacleGap, failing: boolean): Remedy[] {
  const { spec, settings } = context;
  const remedies: Remedy[] = [];
  const pan = spec.oilPan as OilPanSpec;
  const required = settings.minGapBelowMm;
  // A failing check is brought to the limit; a tight one to the edge of the tight band.
  const target = failing ? 0 : settings.tightBandMm;
  const judged = judgeCandidatePans(context);
  const candidates = clearingPans(judged, config.kinds);
  const sumpPosition = sumpNeeded(spec, worst.obstacle, candidates[0]?.pan);
  remedies.push({
    kind: 'part',
    category: 'oil-pan',
    requires: { sumpPosition, railPattern: spec.engine.panRail.pattern },
    partIds: candidates.map((c) => c.pan.id),
    note: candidates.length
      ? `A ${sumpPosition}-sump pan that bolts to this engine's block clears ${config.label} in this placement: ` +
        candidates.map((c) => `${c.pan.name} by ${mmWithInches(c.thisCheckMargin + required)}`).join('; ') +
        '. Fit the matching pickup and check the dipstick.' +
        leftOutPansSentence(judged)
      : `No candidate pan clears ${config.label} in this placement; look for a ${sumpPosition}-sump pan that bolts to this engine's block.` +
        leftOutPansSentence(judged),
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
  remedies.push({ kind: 'fabrication', operation: fab.operation, laborHours: fab.laborHours, note: fab.note, ...(fab.operationCode && { operationCode: fab.operationCode }) });
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
  const worst = panObstacleGap(spec, placed.pan!, config.kinds) as ObstacleGap;
  const gap = worst.result.gap;
  const fig = figures(gap, settings.minGapBelowMm, settings);
  const name = `${config.label} (${worst.obstacle.name})`;
  const message =
    gap >= 0
      ? `The oil pan clears ${name} by ${mmWithInches(gap)}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The oil pan runs ${mmWithInches(-gap)} into ${name}: it would have to rise ${mmWithInches(-gap)} just to touch free and ${mmWithInches(-fig.margin)} to leave the required ${mmWithInches(fig.required)}.`;
  const remedies = fig.status === 'ok' ? [] : panRemedies(context, config, worst, fig.status === 'fails');
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
