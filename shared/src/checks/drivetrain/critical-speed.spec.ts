import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { checkCriticalSpeed } from './critical-speed';
import { specWith, systemFitSpec } from './system-spec.fixture';

const run = (spec: FitSpec) => checkCriticalSpeed({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('drivetrain.critical-speed', () => {
  it('ok: 3.000 × 0.083 × 50 in steel at 3870.6 rpm', () => {
    // Source: Machinery's Handbook 31st ed., "Critical Speeds": 7857.7 rpm by the handbook formula, which the
    // check computes and cites. Derived: 160 km/h on a 750 mm tyre with a 3.42 axle = 3870.6 rpm.
    const finding = run(systemFitSpec());
    expect(finding.status).toBe('ok');
    expect(finding.measured).toBeCloseTo(3870.6, 1);
    expect(finding.required).toBeCloseTo(0.75 * 7857.7, 0);
    expect(finding.thresholdSource).toContain('4,760,000');
  });

  it('fails: 6000 rpm through a 0.70 overdrive', () => {
    // Common practice (no published source): 8571 rpm at the shaft fails 75 % of critical.
    const finding = run(specWith((s) => {
      delete s.goals.topSpeedKph;
      s.goals.revLimitRpm = 6000;
    }));
    expect(finding.status).toBe('fails');
    expect(finding.measured).toBeCloseTo(8571.4, 1);
  });

  it('tight within 250 rpm of the allowed speed', () => {
    // Derived: allowed 5802.4 rpm; 5650 rpm is 152 rpm under it.
    const finding = run(specWith((s) => {
      delete s.goals.topSpeedKph;
      s.goals.revLimitRpm = 5650 * 0.7;
    }));
    expect(finding.status).toBe('tight');
  });

  it('unknown without a driveshaft or transmission', () => {
    expect(run(specWith((s) => delete s.driveshaft))).toMatchObject({ status: 'unknown', missing: ['driveshaft'] });
    expect(run(specWith((s) => {
      delete s.driveshaft;
      delete s.transmission;
    }))).toMatchObject({ status: 'unknown', missing: ['transmission', 'driveshaft'] });
  });
});
