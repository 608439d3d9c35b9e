import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkPickupScreen } from './pickup-screen';

const run = (spec: FitSpec) => checkPickupScreen({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('oiling.pickup-screen', () => {
  // Common practice (no published source): screen 6–10 mm (1/4–3/8 in) above the sump floor.
  it('ok at 8 mm', () => {
    expect(run(systemFitSpec())).toMatchObject({ status: 'ok', measured: 8, margin: 2 });
  });

  it('tight at 9.5 mm', () => {
    expect(run(specWith((s) => (s.oilPickup!.screenW = -190.5)))).toMatchObject({ status: 'tight', limit: 'max', margin: 0.5 });
  });

  it('fails at 3 mm and names a pickup at the right height', () => {
    const finding = run(specWith((s) => (s.oilPickup!.screenW = -197)));
    expect(finding).toMatchObject({ status: 'fails', limit: 'min', margin: -3 });
    expect(finding.remedies[0]).toMatchObject({ category: 'oil-pickup', partIds: ['pickup-rear-c'] });
  });

  it('fails when the screen is not over the sump', () => {
    const finding = run(specWith((s) => (s.oilPickup!.screenU = 400)));
    expect(finding.status).toBe('fails');
    expect(finding.message).toContain('not over');
  });

  it('unknown without a pan', () => {
    expect(run(specWith((s) => delete s.oilPan))).toMatchObject({ status: 'unknown', missing: ['oilPan'] });
  });
});
