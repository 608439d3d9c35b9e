import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkHoseSides } from './hose-sides';
import { checkRadiatorCapacity } from './radiator-capacity';

const context = (spec: FitSpec) => ({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('cooling.radiator-capacity', () => {
  // Common practice (no published source): heat to coolant ≈ brake power; size for continuous power; 10 % margin.
  it('ok: 150 kW continuous against 200 × 0.9 = 180 kW', () => {
    expect(checkRadiatorCapacity(context(systemFitSpec()))).toMatchObject({ status: 'ok', measured: 180, required: 150, margin: 30 });
  });

  it('tight at 175 kW continuous, fails at target power without a continuous figure', () => {
    expect(checkRadiatorCapacity(context(specWith((s) => (s.goals.continuousPowerKw = 175)))).status).toBe('tight');
    const finding = checkRadiatorCapacity(context(specWith((s) => delete s.goals.continuousPowerKw)));
    expect(finding.status).toBe('fails');
    expect(finding.required).toBeCloseTo(298.28, 2);
    // Derived: 298.28 / 0.9 = 331.4 → 332 kW.
    expect(finding.remedies[0]).toMatchObject({ category: 'radiator', requires: { minRatedKw: 332 } });
  });

  it('unknown without a radiator rating', () => {
    expect(checkRadiatorCapacity(context(specWith((s) => (s.chassis.radiatorCore.ratedKw = 0))))).toMatchObject({
      status: 'unknown',
      missing: ['chassis.radiatorCore.ratedKw'],
    });
  });
});

describe('cooling.hose-sides', () => {
  it('ok when outlet meets inlet on each side', () => {
    expect(checkHoseSides(context(systemFitSpec())).status).toBe('ok');
  });

  it('fails when crossed, with a radiator or crossover hoses', () => {
    const finding = checkHoseSides(context(specWith((s) => Object.assign(s.chassis.radiatorCore, { inletSide: 'right', outletSide: 'left' }))));
    expect(finding).toMatchObject({ status: 'fails', measured: 2 });
    expect(finding.remedies[0]).toMatchObject({ category: 'radiator', requires: { inletSide: 'left', outletSide: 'right' } });
    expect(finding.remedies[1]).toMatchObject({ kind: 'fabrication', laborHours: 1 });
  });
});
