import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkDipstick } from './dipstick';

const run = (spec: FitSpec) => checkDipstick({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('oiling.dipstick', () => {
  it('ok when the pan provides for the engine dipstick', () => {
    expect(run(systemFitSpec()).status).toBe('ok');
  });

  it('fails otherwise, with a dipstick for the pan and a pan for the engine', () => {
    const finding = run(specWith((s) => (s.engine.dipstickLocation = 'pan-left')));
    expect(finding.status).toBe('fails');
    expect(finding.remedies.map((r) => r.kind === 'part' && r.category)).toEqual(['dipstick', 'oil-pan']);
  });

  it('unknown without a pan', () => {
    expect(run(specWith((s) => delete s.oilPan))).toMatchObject({ status: 'unknown', missing: ['oilPan'] });
  });
});
