import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkCamTiming, totalCamAdvanceDeg } from './cam-timing';

const run = (spec: FitSpec) => checkCamTiming({ spec, settings: DEFAULT_FIT_SETTINGS });
const cam = (ground: number, recommended: number, set: number | undefined) =>
  specWith((s) => {
    s.engine.cam = { advanceGroundDeg: ground, recommendedTotalDeg: recommended };
    if (set === undefined) delete s.timingSetAdvanceDeg;
    else s.timingSetAdvanceDeg = set;
  });

describe('cam.timing-advance', () => {
  it('ok: advance ground in, marks aligned', () => {
    // Common practice (no published source): a cam with advance ground in is installed with the marks aligned (zero).
    expect(run(systemFitSpec())).toMatchObject({ status: 'ok', measured: 4, required: 4 });
  });

  it('3° ground in + 4° at the timing set = 7°, flagged where 3° is recommended', () => {
    // Common practice (no published source): the 3° + 4° = 7° double-advance mistake.
    expect(totalCamAdvanceDeg(3, 4)).toBe(7);
    const finding = run(cam(3, 3, 4));
    expect(finding).toMatchObject({ status: 'fails', measured: 7, required: 3, margin: -3 });
    expect(finding.remedies[0]).toMatchObject({ category: 'cam-timing-set', requires: { advanceDeg: 0 } });
    expect((finding.remedies[0] as { note: string }).note).toContain('marks aligned');
  });

  it('not flagged where 7° total is recommended', () => {
    expect(run(cam(3, 7, 4)).status).toBe('ok');
  });

  it('tight within a degree, and assumes the marks aligned when unset', () => {
    expect(run(cam(3, 3.5, 0)).status).toBe('tight');
    const unset = run(cam(4, 4, undefined));
    expect(unset.status).toBe('ok');
    expect(unset.message).toContain('assumed');
  });

  it('flags a retarded installation too', () => {
    expect(run(cam(0, 4, -2)).status).toBe('fails');
  });

  it('compares at the tenth of a degree it shows: a total a hair over the recommendation is on it', () => {
    // Common practice (no published source): cam degrees are read to a tenth at best; 4.02° reads as 4.0°.
    const finding = run(cam(4.02, 4, 0));
    expect(finding.status).toBe('ok');
    expect(finding.message).toContain('exactly');
    expect(finding.message).not.toContain('0.0°');
    // Floating-point dust (0.1 + 0.2 = 0.30000000000000004) is not a difference either.
    expect(run(cam(0.1, 0.3, 0.2)).status).toBe('ok');
    // 0.06° over shows as 0.1° and is tight, not a silent pass.
    expect(run(cam(4.06, 4, 0))).toMatchObject({ status: 'tight' });
    expect(run(cam(4.06, 4, 0)).message).toContain('0.1° more advance than');
  });
});
