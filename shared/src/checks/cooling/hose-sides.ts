import type { Finding } from '../../types/finding';
import { measuredFinding, type CheckContext, type CheckDefinition, type FindingFields } from '../check-definition';

const FIELDS: FindingFields = {
  checkId: 'cooling.hose-sides',
  group: 'cooling',
  title: 'Coolant hose sides',
  unit: 'count',
  limit: 'match',
  thresholdSource: "The engine's coolant outlet goes to the radiator inlet and the radiator outlet to the engine's inlet, each on the same side.",
};

export function checkHoseSides({ spec, settings }: CheckContext): Finding {
  const engine = spec.engine;
  const core = spec.chassis.radiatorCore;
  const crossed: string[] = [];
  if (engine.coolantOutletSide !== core.inletSide) {
    crossed.push(`the engine's outlet is on the ${engine.coolantOutletSide} and the radiator inlet on the ${core.inletSide}`);
  }
  if (engine.coolantInletSide !== core.outletSide) {
    crossed.push(`the engine's inlet is on the ${engine.coolantInletSide} and the radiator outlet on the ${core.outletSide}`);
  }
  if (crossed.length === 0) {
    return measuredFinding(
      FIELDS,
      { measured: 0, required: 0, margin: 0, status: 'ok' },
      `Upper hose on the ${core.inletSide}, lower hose on the ${core.outletSide}: both run straight to the radiator.`,
    );
  }
  return measuredFinding(
    FIELDS,
    { measured: crossed.length, required: 0, margin: -1, status: 'fails' },
    `The hoses would cross the front of the engine: ${crossed.join('; ')}.`,
    [
      {
        kind: 'part',
        category: 'radiator',
        requires: { inletSide: engine.coolantOutletSide, outletSide: engine.coolantInletSide, minRatedKw: core.ratedKw },
        partIds: [],
        note: 'A radiator with its inlet and outlet on the engine\'s sides.',
      },
      {
        kind: 'fabrication',
        operation: 'Route crossover coolant hoses clear of the fan and belt',
        laborHours: settings.coolantHoseRerouteHours,
        note: 'Keep hoses clear of the fan, belt and exhaust, and support long runs so they cannot chafe.',
      },
    ],
  );
}

export const HOSE_SIDES_CHECK: CheckDefinition = {
  id: FIELDS.checkId,
  group: FIELDS.group,
  title: FIELDS.title,
  dependsOnPlacement: false,
  run: checkHoseSides,
};
