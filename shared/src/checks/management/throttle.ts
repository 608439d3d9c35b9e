import type { Finding, Remedy } from '../../types/finding';
import { measuredFinding, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { controllerCandidateIds } from './controller-candidates';

const FIELDS: FindingFields = {
  checkId: 'management.throttle',
  group: 'management',
  title: 'Throttle, pedal and controller',
  unit: 'count',
  limit: 'match',
  thresholdSource: 'A cable throttle needs a cable pedal; an electronic throttle needs an electronic pedal and a controller that drives it.',
};

const THROTTLE_CAUTION = 'Throttle controls affect vehicle control: test for a full return to idle before driving, and follow local inspection rules.';

export function checkThrottle({ spec }: CheckContext): Finding {
  const throttle = spec.engine.throttle;
  const pedal = spec.chassis.pedal;
  const controller = spec.controller;
  const problems: string[] = [];
  const remedies: Remedy[] = [];
  if (pedal !== throttle) {
    problems.push(`the engine has a${throttle === 'electronic' ? 'n electronic' : ' cable'} throttle and the chassis a${pedal === 'electronic' ? 'n electronic' : ' cable'} pedal`);
    remedies.push({
      kind: 'part',
      category: 'throttle-pedal',
      requires: { type: throttle },
      partIds: [],
      note: `A${throttle === 'electronic' ? 'n electronic' : ' cable'} pedal assembly for the chassis. ${THROTTLE_CAUTION}`,
    });
  }
  if (controller && !controller.throttles.includes(throttle)) {
    problems.push(`the ${controller.name} does not support a${throttle === 'electronic' ? 'n electronic' : ' cable'} throttle`);
    remedies.push({
      kind: 'part',
      category: 'engine-controller',
      requires: { throttle },
      partIds: controllerCandidateIds(spec, (c) => c.throttles.includes(throttle)),
      note: `A controller that supports the engine's ${throttle} throttle.`,
    });
  }
  const fields = { ...FIELDS, against: controller?.id };
  if (problems.length > 0) {
    return measuredFinding(fields, { measured: problems.length, required: 0, margin: -1, status: 'fails' }, `Throttle mismatch: ${problems.join('; ')}.`, remedies);
  }
  if (!controller) {
    return unknownFinding(FIELDS, ['controller'], `The ${pedal} pedal suits the engine's ${throttle} throttle; choose a controller to finish the check.`);
  }
  return measuredFinding(
    fields,
    { measured: 0, required: 0, margin: 0, status: 'ok' },
    `The engine's ${throttle} throttle, the chassis's ${pedal} pedal and the ${controller.name} agree.`,
  );
}

export const THROTTLE_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkThrottle,
};
