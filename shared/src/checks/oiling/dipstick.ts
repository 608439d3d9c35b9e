import type { Finding } from '../../types/finding';
import { measuredFinding, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { judgeCandidatePans, keptPanWords, leftOutPansSentence, pansThatClear } from '../envelope/pan-clearance';

const FIELDS: FindingFields = {
  checkId: 'oiling.dipstick',
  group: 'oiling',
  title: 'Dipstick location',
  unit: 'count',
  limit: 'match',
  thresholdSource: "The engine's dipstick location must be one the pan provides for (tube hole or clearance).",
};

export function checkDipstick(context: CheckContext): Finding {
  const { spec } = context;
  const pan = spec.oilPan;
  if (!pan) return unknownFinding(FIELDS, ['oilPan']);
  const location = spec.engine.dipstickLocation;
  const fields = { ...FIELDS, against: pan.id };
  if (pan.dipstickProvision.includes(location)) {
    return measuredFinding(fields, { measured: 0, required: 0, margin: 0, status: 'ok' }, `The ${pan.name} provides for the engine's ${location} dipstick.`);
  }
  const provided = pan.dipstickProvision.length > 0 ? pan.dipstickProvision.join(', ') : 'no dipstick';
  // Offered only when it also keeps every clearance below the engine here, as the envelope checks measure it.
  const judged = judgeCandidatePans(context, (p) => p.railPattern === pan.railPattern && p.sumpPosition === pan.sumpPosition && p.dipstickProvision.includes(location));
  const kept = pansThatClear(judged);
  return measuredFinding(
    fields,
    { measured: 1, required: 0, margin: -1, status: 'fails' },
    `The engine's dipstick is at ${location} but the ${pan.name} provides for ${provided}.`,
    [
      ...(pan.dipstickProvision.length > 0
        ? [
            {
              kind: 'part' as const,
              category: 'dipstick' as const,
              requires: { location: pan.dipstickProvision[0] },
              partIds: [],
              note: `A dipstick and tube for the pan's ${pan.dipstickProvision[0]} provision; mark it against the pan's capacity of ${pan.capacityL} L.`,
            },
          ]
        : []),
      {
        kind: 'part',
        category: 'oil-pan',
        requires: { railPattern: pan.railPattern, sumpPosition: pan.sumpPosition, dipstickProvision: location },
        partIds: kept.map((j) => j.pan.id),
        note:
          (kept.length
            ? `A pan with the same sump that provides for the engine's dipstick and keeps every clearance below the engine at this placement: ${kept.map(keptPanWords).join('; ')}.`
            : "No candidate pan with the same sump provides for the engine's dipstick and keeps every clearance below the engine at this placement.") +
          leftOutPansSentence(judged),
      },
    ],
  );
}

export const DIPSTICK_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  // The verdict does not move with the engine, but the pans it offers must clear what is below it where it sits.
  dependsOnPlacement: true,
  run: checkDipstick,
};
