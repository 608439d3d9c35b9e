import { oilSystemMismatches } from '../../oiling/oil-system';
import type { Finding, Remedy } from '../../types/finding';
import type { FitSpec, OilPanSpec, OilPickupSpec, OilPumpSpec } from '../../types/fit-spec';
import { measuredFinding, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { judgeCandidatePans, keptPanWords, leftOutPansSentence, pansThatClear } from '../envelope/pan-clearance';

const FIELDS: FindingFields = {
  checkId: 'oiling.pan-pickup-pump',
  group: 'oiling',
  title: 'Oil pan, pickup and pump agree',
  unit: 'count',
  limit: 'match',
  thresholdSource: 'The pan must fit the block rail; the pickup must suit the sump position, the pan\'s pickup mounting and the pump inlet.',
};

export function missingOilParts(spec: FitSpec, parts: Array<'oilPan' | 'oilPickup' | 'oilPump'>): string[] {
  return parts.filter((part) => spec[part] === undefined);
}

export function checkPanPickupPump(context: CheckContext): Finding {
  const { spec } = context;
  const missing = missingOilParts(spec, ['oilPan', 'oilPickup', 'oilPump']);
  const { oilPan: pan, oilPickup: pickup, oilPump: pump } = spec;
  if (!pan || !pickup || !pump) return unknownFinding(FIELDS, missing);
  const mismatches = oilSystemMismatches(spec.engine.panRail.pattern, pan, pickup, pump);
  const fields = { ...FIELDS, against: pan.id };
  if (mismatches.length === 0) {
    return measuredFinding(
      fields,
      { measured: 0, required: 0, margin: 0, status: 'ok' },
      `The ${pan.name}, ${pickup.name} and ${pump.name} agree: ${pan.sumpPosition} sump, ${pan.pickupMount} pickup, ${pump.inlet} pump inlet.`,
    );
  }
  const message = `The oil parts do not agree: ${mismatches.map((m) => m.message).join('; ')}.`;
  const fields2 = new Set(mismatches.map((m) => m.field));
  const remedies: Remedy[] = [];
  if (fields2.has('sumpPosition') || fields2.has('pickupMount') || fields2.has('pumpInlet')) {
    remedies.push(pickupRemedy(spec, pan, pump));
  }
  if (fields2.has('pumpInlet')) remedies.push(pumpRemedy(spec, pickup));
  if (fields2.has('railPattern') || fields2.has('sumpPosition') || fields2.has('pickupMount')) {
    remedies.push(panRemedy(context, pickup, fields2.has('railPattern')));
  }
  return measuredFinding(fields, { measured: mismatches.length, required: 0, margin: -1, status: 'fails' }, message, remedies);
}

function pickupRemedy(spec: FitSpec, pan: OilPanSpec, pump: OilPumpSpec): Remedy {
  const partIds = (spec.candidates?.oilPickups ?? [])
    .filter((p) => p.sumpPosition === pan.sumpPosition && p.mount === pan.pickupMount && p.pumpInlet === pump.inlet)
    .map((p) => p.id);
  return {
    kind: 'part',
    category: 'oil-pickup',
    requires: { sumpPosition: pan.sumpPosition, mount: pan.pickupMount, pumpInlet: pump.inlet },
    partIds,
    note: `A pickup for the ${pan.name}'s ${pan.sumpPosition} sump that fits the ${pump.name}.`,
  };
}

function pumpRemedy(spec: FitSpec, pickup: OilPickupSpec): Remedy {
  const partIds = (spec.candidates?.oilPumps ?? [])
    .filter((p) => p.inlet === pickup.pumpInlet)
    .sort((a, b) => b.speedLimitRpm - a.speedLimitRpm)
    .map((p) => p.id);
  return {
    kind: 'part',
    category: 'oil-pump',
    requires: { inlet: pickup.pumpInlet },
    partIds,
    note: `A pump whose inlet takes the ${pickup.name}.`,
  };
}

/**
 * Pans that bolt to the block and (unless the rail is what disagrees) take this pickup, offered only when they also
 * keep every clearance below the engine at this placement, judged by the envelope checks' own measure; the note
 * names each one left out and the rule it would fail.
 */
function panRemedy(context: CheckContext, pickup: OilPickupSpec, railMismatch: boolean): Remedy {
  const railPattern = context.spec.engine.panRail.pattern;
  const judged = judgeCandidatePans(context, (p) => railMismatch || (p.sumpPosition === pickup.sumpPosition && p.pickupMount === pickup.mount));
  const kept = pansThatClear(judged);
  const wanted = railMismatch ? "A pan for this engine's block that" : `A pan whose sump and pickup mounting suit the ${pickup.name} and that`;
  const note = kept.length
    ? `${wanted} keeps every clearance below the engine at this placement: ${kept.map(keptPanWords).join('; ')}.`
    : railMismatch
      ? "No candidate pan for this engine's block keeps every clearance below the engine at this placement."
      : `No candidate pan for a ${pickup.sumpPosition} sump with a ${pickup.mount} pickup keeps every clearance below the engine at this placement.`;
  return {
    kind: 'part',
    category: 'oil-pan',
    requires: railMismatch ? { railPattern } : { railPattern, sumpPosition: pickup.sumpPosition, pickupMount: pickup.mount },
    partIds: kept.map((j) => j.pan.id),
    note: note + leftOutPansSentence(judged),
  };
}

export const PAN_PICKUP_PUMP_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  // The verdict does not move with the engine, but the pans it offers must clear what is below it where it sits.
  dependsOnPlacement: true,
  run: checkPanPickupPump,
};
