import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { controllerCandidateIds } from './controller-candidates';

const FIELDS: FindingFields = {
  checkId: 'management.cylinders',
  group: 'management',
  title: 'Cylinders the controller can run',
  unit: 'count',
  limit: 'max',
  thresholdSource: "The controller's rated number of cylinders (injector and ignition outputs).",
};

export function checkCylinderCount({ spec }: CheckContext): Finding {
  const controller = spec.controller;
  if (!controller) return unknownFinding(FIELDS, ['controller']);
  const cylinders = spec.engine.cylinders;
  const margin = controller.maxCylinders - cylinders;
  return measuredFinding(
    { ...FIELDS, against: controller.id },
    { measured: cylinders, required: controller.maxCylinders, margin, status: statusFromMargin(margin, 0) },
    `The engine has ${cylinders} cylinders; the ${controller.name} runs up to ${controller.maxCylinders}.`,
    [
      {
        kind: 'part',
        category: 'engine-controller',
        requires: { minCylinders: cylinders },
        partIds: controllerCandidateIds(spec, (c) => c.maxCylinders >= cylinders),
        note: `A controller with outputs for ${cylinders} cylinders.`,
      },
    ],
  );
}

export const CYLINDER_COUNT_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkCylinderCount,
};
