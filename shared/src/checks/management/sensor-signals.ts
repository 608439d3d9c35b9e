import type { Finding } from '../../types/finding';
import { measuredFinding, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { controllerCandidateIds } from './controller-candidates';

type SignalKind = 'crank' | 'cam';

function fieldsFor(kind: SignalKind): FindingFields {
  return {
    checkId: `management.${kind}-signal`,
    group: 'management',
    title: `${kind === 'crank' ? 'Crank' : 'Cam'} sensor signal`,
    unit: 'count',
    limit: 'match',
    thresholdSource: `The controller must decode the engine's ${kind} trigger pattern.`,
  };
}

function checkSignal(kind: SignalKind, { spec }: CheckContext): Finding {
  const fields = fieldsFor(kind);
  const controller = spec.controller;
  if (!controller) return unknownFinding(fields, ['controller']);
  const signal = kind === 'crank' ? spec.engine.crankSignal : spec.engine.camSignal;
  const supported: readonly string[] = kind === 'crank' ? controller.crankSignals : controller.camSignals;
  const against = { ...fields, against: controller.id };
  if (supported.includes(signal)) {
    return measuredFinding(against, { measured: 0, required: 0, margin: 0, status: 'ok' }, `The ${controller.name} reads the engine's ${signal} ${kind} signal.`);
  }
  return measuredFinding(
    against,
    { measured: 1, required: 0, margin: -1, status: 'fails' },
    `The engine's ${kind} signal is ${signal}; the ${controller.name} reads ${supported.length > 0 ? supported.join(', ') : 'no'} ${kind} patterns.`,
    [
      {
        kind: 'part',
        category: 'engine-controller',
        requires: { [`${kind}Signal`]: signal },
        partIds: controllerCandidateIds(spec, (c) => ((kind === 'crank' ? c.crankSignals : c.camSignals) as readonly string[]).includes(signal)),
        note: `A controller that decodes ${signal} (or a trigger wheel and sensor the ${controller.name} reads, fitted to the engine).`,
      },
    ],
  );
}

export const checkCrankSignal = (context: CheckContext): Finding => checkSignal('crank', context);
export const checkCamSignal = (context: CheckContext): Finding => checkSignal('cam', context);

export const CRANK_SIGNAL_CHECK: CheckDefinition = {
  id: 'management.crank-signal',
  group: 'management',
  title: 'Crank sensor signal',
  dependsOnPlacement: false,
  run: checkCrankSignal,
};

export const CAM_SIGNAL_CHECK: CheckDefinition = {
  id: 'management.cam-signal',
  group: 'management',
  title: 'Cam sensor signal',
  dependsOnPlacement: false,
  run: checkCamSignal,
};
