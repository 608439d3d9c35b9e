import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { checkBellhousingPattern } from './bellhousing-pattern';
import { specWith, systemFitSpec } from './system-spec.fixture';

const run = (spec: FitSpec) => checkBellhousingPattern({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('drivetrain.bellhousing-pattern', () => {
  it('ok when the patterns match', () => {
    expect(run(systemFitSpec())).toMatchObject({ status: 'ok', margin: 0, limit: 'match', remedies: [] });
  });

  it('fails with the adapters that join them, thinnest first', () => {
    const finding = run(specWith((s) => (s.transmission!.bellPattern = 'bell-b')));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ kind: 'part', category: 'bellhousing-adapter', partIds: ['adapter-thin', 'adapter-thick'] });
    expect(finding.message).toContain('adapter plate 12');
  });

  it('fails with an empty part list when no adapter fits', () => {
    const finding = run(specWith((s) => (s.transmission!.bellPattern = 'bell-z')));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ requires: { enginePattern: 'bell-a', transmissionPattern: 'bell-z' }, partIds: [] });
  });

  it('unknown without a transmission', () => {
    expect(run(specWith((s) => delete s.transmission))).toMatchObject({ status: 'unknown', missing: ['transmission'] });
  });
});
