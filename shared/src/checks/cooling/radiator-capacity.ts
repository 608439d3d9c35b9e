import { heatToCoolantKw, requiredRadiatorRatingKw, usableRadiatorKw } from '../../cooling/heat-rejection';
import type { Finding } from '../../types/finding';
import { measuredFinding, statusFromMargin, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';

const FIELDS: FindingFields = {
  checkId: 'cooling.radiator-capacity',
  group: 'cooling',
  title: 'Radiator capacity',
  unit: 'kW',
  limit: 'min',
  thresholdSource:
    'Common practice (no published source): heat to coolant about equal to brake power at full throttle, radiator sized for continuous power with a margin in hand.',
};

export function checkRadiatorCapacity({ spec, settings }: CheckContext): Finding {
  const core = spec.chassis.radiatorCore;
  if (!(core.ratedKw > 0)) return unknownFinding(FIELDS, ['chassis.radiatorCore.ratedKw']);
  const continuous = spec.goals.continuousPowerKw;
  const powerKw = continuous ?? spec.goals.targetPowerKw;
  const required = heatToCoolantKw(powerKw, settings.heatToCoolantFraction);
  const measured = usableRadiatorKw(core.ratedKw, settings.coolingMargin);
  const margin = measured - required;
  const status = statusFromMargin(margin, settings.coolingTightBandFraction * required);
  const basis = continuous === undefined ? 'target power' : 'continuous power';
  const message = `At ${powerKw.toFixed(0)} kW ${basis} the coolant carries about ${required.toFixed(0)} kW; the ${core.ratedKw.toFixed(0)} kW radiator gives ${measured.toFixed(0)} kW after a ${Math.round(settings.coolingMargin * 100)} % margin.`;
  return measuredFinding(FIELDS, { measured, required, margin, status }, message, [
    {
      kind: 'part',
      category: 'radiator',
      requires: { minRatedKw: Math.ceil(requiredRadiatorRatingKw(required, settings.coolingMargin)), inletSide: spec.engine.coolantOutletSide, outletSide: spec.engine.coolantInletSide },
      partIds: [],
      note: 'A larger core, or a second row, with a shroud and fan sized to pull air through it at low speed.',
    },
  ]);
}

export const RADIATOR_CAPACITY_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkRadiatorCapacity,
};
