import type { Finding, Remedy } from '../../types/finding';
import type { Placement } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy, solvePlacementChange, worstGap } from './envelope-common';
import { obstaclesOfKinds, placedForSpec, placeEngine } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';
import { outlineGapValue } from '../../geometry/outline-gap';

export const HEADS_FIREWALL_ID = 'envelope.heads-firewall';
export const FIREWALL_KINDS = ['firewall'] as const;

/**
 * Rear of the heads (the engine's rearProfile, an open line) against the firewall. An overlap is measured
 * as the forward move that clears it, the way the engine would go to get out of the firewall.
 */
export function runHeadsFirewall({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: HEADS_FIREWALL_ID,
    group: 'envelope' as const,
    title: 'Rear of heads to firewall',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE} (the shop's minimum clearance to the firewall).`,
  };
  const missing: string[] = [];
  if (!spec.engine.rearProfile || spec.engine.rearProfile.length === 0) missing.push('engine.rearProfile');
  const walls = obstaclesOfKinds(spec, [...FIREWALL_KINDS]);
  if (walls.length === 0) missing.push('chassis.obstacles (kind firewall)');
  if (missing.length) return unknownFinding(fields, missing);
  const worst = worstGap(placedForSpec(spec).rearProfile, false, walls, 0, 'forward')!;
  const gap = worst.result.gap;
  const fig = figures(gap, settings.minFirewallGapMm, settings);
  const message =
    gap >= 0
      ? `The rear of the heads clears the firewall (${worst.obstacle.name}) by ${mmWithInches(gap)}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The rear of the heads runs ${mmWithInches(-gap)} into the firewall (${worst.obstacle.name}); it needs ${mmWithInches(-fig.margin)} more room.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    const marginAt = (p: Placement): number =>
      worstGap(placeEngine(spec, p).rearProfile, false, [worst.obstacle], 0, 'forward')!.result.gap - fig.required - target;
    const shift = solvePlacementChange(spec.placement, 'setback', -1, marginAt, 300);
    if (shift !== null) {
      remedies.push(placementRemedy('setback', shift, `Move the engine forward ${mmWithInches(-shift)}; recheck the fan to radiator gap and the crossmember.`));
    }
    remedies.push({
      kind: 'fabrication',
      operation: 'Recess the firewall behind the heads',
      laborHours: settings.firewallFabricationHours,
      note: 'Seal the recess against fumes and water; protect wiring and brake lines, and keep a fire extinguisher at hand while welding or cutting.',
    });
  }
  return measuredFinding({ ...fields, against: worst.obstacle.id }, fig, message, remedies);
}

export const HEADS_FIREWALL_CHECK: CheckDefinition = {
  id: HEADS_FIREWALL_ID,
  group: 'envelope',
  title: 'Rear of heads to firewall',
  dependsOnPlacement: true,
  run: runHeadsFirewall,
  windowTerms: (spec, settings, base) => {
    const rear = base.rearProfile;
    if (!rear.length) return {};
    return {
      constraints: obstaclesOfKinds(spec, [...FIREWALL_KINDS]).map((wall) => ({
        bound: { checkId: HEADS_FIREWALL_ID, against: wall.id },
        trend: 'any' as const,
        // Scanned upward, so an overlap is measured as the lift that clears it (the passing set is the same in any direction).
        marginAt: (heightMm: number) => outlineGapValue(rear, false, wall.outline, heightMm) - settings.minFirewallGapMm,
      })),
    };
  },
};
