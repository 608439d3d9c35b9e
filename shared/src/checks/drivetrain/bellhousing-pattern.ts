import type { Finding } from '../../types/finding';
import { measuredFinding, unknownFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';
import { matchingBellhousingAdapters } from './driveline-layout';
import { mmWithInches } from '../../units/figure-format';

const FIELDS: FindingFields = {
  checkId: 'drivetrain.bellhousing-pattern',
  group: 'drivetrain',
  title: 'Bellhousing pattern',
  unit: 'count',
  limit: 'match',
  thresholdSource: 'The engine and transmission bolt patterns must be the same, or an adapter must join them.',
};

export function checkBellhousingPattern({ spec }: CheckContext): Finding {
  const transmission = spec.transmission;
  if (!transmission) return unknownFinding(FIELDS, ['transmission']);
  const fields = { ...FIELDS, against: transmission.id };
  const enginePattern = spec.engine.bellPattern;
  if (transmission.bellPattern === enginePattern) {
    return measuredFinding(
      fields,
      { measured: 0, required: 0, margin: 0, status: 'ok' },
      `The engine and the ${transmission.name} share the ${enginePattern} bellhousing pattern.`,
    );
  }
  const adapters = matchingBellhousingAdapters(spec);
  const first = adapters[0];
  const message = first
    ? `The engine has the ${enginePattern} bellhousing pattern and the ${transmission.name} has ${transmission.bellPattern}; adapter ${first.name} joins them and moves the transmission back ${mmWithInches(first.thicknessMm)}.`
    : `The engine has the ${enginePattern} bellhousing pattern and the ${transmission.name} has ${transmission.bellPattern}, and no adapter in the catalog joins them.`;
  return measuredFinding(fields, { measured: 1, required: 0, margin: -1, status: 'fails' }, message, [
    {
      kind: 'part',
      category: 'bellhousing-adapter',
      requires: { enginePattern, transmissionPattern: transmission.bellPattern },
      partIds: adapters.map((adapter) => adapter.id),
      note: 'The adapter plate or bellhousing moves the transmission rearward by its thickness; the driveshaft and crossmember checks already allow for it.',
    },
  ]);
}

export const BELLHOUSING_PATTERN_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkBellhousingPattern,
};
