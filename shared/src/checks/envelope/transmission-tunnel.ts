import type { Finding, Remedy } from '../../types/finding';
import type { Placement } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures, placementRemedy, solvePlacementChange, worstGap } from './envelope-common';
import { obstaclesOfKinds, placedForSpec, placeEngine } from './placed-engine';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';
import { outlineGapValue } from '../../geometry/outline-gap';

export const TRANSMISSION_TUNNEL_ID = 'envelope.transmission-tunnel';
export const TUNNEL_KINDS = ['tunnel'] as const;

/**
 * Bellhousing and transmission side profile against the tunnel (in the side view the case sits in the
 * tunnel opening of the firewall, so the tunnel outline carries the firewall's lower edge). The tunnel is
 * above the case: an overlap is measured as the drop that clears it.
 */
export function runTransmissionTunnel({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: TRANSMISSION_TUNNEL_ID,
    group: 'envelope' as const,
    title: 'Bellhousing and transmission to tunnel',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE} (the shop's minimum clearance to the firewall and tunnel).`,
  };
  const missing: string[] = [];
  if (!spec.transmission || spec.transmission.sideProfile.length < 3) missing.push('transmission.sideProfile');
  const tunnels = obstaclesOfKinds(spec, [...TUNNEL_KINDS]);
  if (tunnels.length === 0) missing.push('chassis.obstacles (kind tunnel)');
  if (missing.length) return unknownFinding(fields, missing);
  const worst = worstGap(placedForSpec(spec).transmission!, true, tunnels, 0, 'down')!;
  const gap = worst.result.gap;
  const fig = figures(gap, settings.minFirewallGapMm, settings);
  const message =
    gap >= 0
      ? `The bellhousing and transmission clear the tunnel (${worst.obstacle.name}) by ${mmWithInches(gap)}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `The transmission runs ${mmWithInches(-gap)} into the tunnel (${worst.obstacle.name}); it needs ${mmWithInches(-fig.margin)} more room.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    const target = fig.status === 'fails' ? 0 : settings.tightBandMm;
    const marginAt = (p: Placement): number =>
      worstGap(placeEngine(spec, p).transmission!, true, [worst.obstacle], 0, 'down')!.result.gap - fig.required - target;
    const drop = solvePlacementChange(spec.placement, 'height', -1, marginAt, 300);
    if (drop !== null) remedies.push(placementRemedy('height', drop, `Lower the engine ${mmWithInches(-drop)}; recheck the pan and ground clearance.`));
    remedies.push({
      kind: 'fabrication',
      operation: 'Open up and re-skin the transmission tunnel',
      laborHours: settings.tunnelFabricationHours,
      note: 'Cut and weld away from fuel and brake lines; seal the tunnel against exhaust fumes.',
    });
  }
  return measuredFinding({ ...fields, against: worst.obstacle.id }, fig, message, remedies);
}

export const TRANSMISSION_TUNNEL_CHECK: CheckDefinition = {
  id: TRANSMISSION_TUNNEL_ID,
  group: 'envelope',
  title: 'Bellhousing and transmission to tunnel',
  dependsOnPlacement: true,
  run: runTransmissionTunnel,
  windowTerms: (spec, settings, base) => {
    if (!base.transmission) return {};
    // Mirrored in z once: the drop that clears the tunnel is the lift of the mirror image (shifted by −height).
    const mirroredCase = base.transmission.map((p) => ({ x: p.x, z: -p.z }));
    return {
      constraints: obstaclesOfKinds(spec, [...TUNNEL_KINDS]).map((tunnel) => {
        const mirroredRoof = tunnel.outline.map((p) => ({ x: p.x, z: -p.z }));
        return {
          bound: { checkId: TRANSMISSION_TUNNEL_ID, against: tunnel.id },
          // The tunnel is above the case: the margin falls as the engine rises; an overlap is the drop that clears it.
          trend: 'falls' as const,
          marginAt: (heightMm: number) => outlineGapValue(mirroredCase, true, mirroredRoof, -heightMm) - settings.minFirewallGapMm,
        };
      }),
    };
  },
};
