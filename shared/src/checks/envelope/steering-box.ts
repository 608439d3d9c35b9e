import type { Finding, Remedy } from '../../types/finding';
import type { ChassisSpec } from '../../types/fit-spec';
import type { CheckContext, CheckDefinition } from '../check-definition';
import { measuredFinding, unknownFinding } from '../check-definition';
import { COMMON_PRACTICE, figures } from './envelope-common';
import { placedForSpec, type PlacedWidthBox } from './placed-engine';
import { clearFinding } from './rail-width';
import { mmWithInches } from '../../units/figure-format';
import { marginWords } from '../../units/margin-words';

export const STEERING_BOX_ID = 'envelope.steering-box';

type SteeringBox = NonNullable<ChassisSpec['steeringBox']>;

/** Lateral gap from a box's side to the steering box's inboard face (inboardY is negative on the left). */
export function steeringBoxGap(box: PlacedWidthBox, steering: SteeringBox): number {
  return steering.side === 'left' ? -steering.inboardY - box.halfWidthLeftMm : steering.inboardY - box.halfWidthRightMm;
}

function overlaps(a0: number, a1: number, b0: number, b1: number): boolean {
  return a0 < b1 && a1 > b0;
}

/** The tightest width box beside the steering box (x and z spans overlapping), or null when none is beside it. */
export function measureSteeringBox(boxes: readonly PlacedWidthBox[], steering: SteeringBox, dz = 0): { box: PlacedWidthBox; gap: number } | null {
  let worst: { box: PlacedWidthBox; gap: number } | null = null;
  for (const box of boxes) {
    if (!overlaps(box.xMin, box.xMax, steering.xFrom, steering.xTo)) continue;
    if (!overlaps(box.zMin + dz, box.zMax + dz, steering.zFrom, steering.zTo)) continue;
    const gap = steeringBoxGap(box, steering);
    if (worst === null || gap < worst.gap) worst = { box, gap };
  }
  return worst;
}

export function runSteeringBox({ spec, settings }: CheckContext): Finding {
  const fields = {
    checkId: STEERING_BOX_ID,
    group: 'envelope' as const,
    title: 'Accessory drive and exhaust to steering box',
    unit: 'mm' as const,
    thresholdSource: `${COMMON_PRACTICE} (the shop's minimum clearance to the steering box).`,
    against: 'steering-box',
  };
  const steering = spec.chassis.steeringBox;
  if (!steering) return unknownFinding(fields, ['chassis.steeringBox']);
  const placed = placedForSpec(spec);
  if (placed.widthBoxes.length === 0) return unknownFinding(fields, ['engine.widthFeatures or engine.accessoryDrives']);
  const worst = measureSteeringBox(placed.widthBoxes, steering);
  if (!worst) return clearFinding(fields, settings.minSteeringBoxGapMm, 'No part of the engine is beside the steering box at this placement.');
  const fig = figures(worst.gap, settings.minSteeringBoxGapMm, settings);
  const message =
    worst.gap >= 0
      ? `${worst.box.name} clears the steering box by ${mmWithInches(worst.gap)}; at least ${mmWithInches(fig.required)} is required: ${marginWords(fig.margin, mmWithInches)}.`
      : `${worst.box.name} reaches ${mmWithInches(-worst.gap)} past the inboard face of the steering box.`;
  const remedies: Remedy[] = [];
  if (fig.status !== 'ok') {
    remedies.push({
      kind: 'part',
      category: worst.box.source === 'accessory-drive' ? 'accessory-drive' : 'exhaust-manifold',
      requires: { maxHalfWidthMm: Math.floor((Math.abs(steering.inboardY) - fig.required) * 10) / 10, side: steering.side },
      partIds: [],
      note: `${worst.box.name} must be ${mmWithInches(-fig.margin + (fig.status === 'fails' ? 0 : settings.tightBandMm))} narrower on the ${steering.side}.`,
    });
    remedies.push({
      kind: 'fabrication',
      operation: 'Relocate the steering box or fit a swap steering box bracket',
      laborHours: settings.steeringLinkageFabricationHours,
      note: 'Steering changes are safety-critical: use parts made for the purpose and have the steering inspected before driving.',
    });
  }
  return measuredFinding(fields, fig, message, remedies);
}

export const STEERING_BOX_CHECK: CheckDefinition = {
  id: STEERING_BOX_ID,
  group: 'envelope',
  title: 'Accessory drive and exhaust to steering box',
  dependsOnPlacement: true,
  run: runSteeringBox,
  // A width feature beside the steering box and closer than the minimum gap forbids the heights where they are level.
  windowTerms: (spec, settings, base) => {
    const steering = spec.chassis.steeringBox;
    if (!steering || !base.widthBoxes.length) return {};
    const bound = { checkId: STEERING_BOX_ID, against: 'steering-box' };
    return {
      bands: base.widthBoxes
        .filter((box) => box.xMin < steering.xTo && box.xMax > steering.xFrom && steeringBoxGap(box, steering) < settings.minSteeringBoxGapMm)
        .map((box) => ({ fromMm: steering.zFrom - box.zMax, toMm: steering.zTo - box.zMin, bound })),
      marginsAt: (heightMm) => {
        const nearest = measureSteeringBox(base.widthBoxes, steering, heightMm);
        return nearest ? [{ bound, margin: nearest.gap - settings.minSteeringBoxGapMm }] : [];
      },
    };
  },
};
