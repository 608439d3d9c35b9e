import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { checkUJointAngles } from './u-joint-angles';
import { FIXTURE_PINION, specWith, systemFitSpec } from './system-spec.fixture';

const run = (spec: FitSpec) => checkUJointAngles({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('drivetrain.u-joint-angles', () => {
  it('ok: 4.0 in drop over 50.0 in, 3° tilt, pinion parallel → 1.5886° each', () => {
    // Source: published driveline-maker guidance, worked example (front = rear = 1.5886°, passes).
    const finding = run(systemFitSpec());
    expect(finding.status).toBe('ok');
    expect(finding.message).toContain('Front joint 1.59°, rear 1.59°, difference 0.00°');
    // Derived: the difference (0° against 1°) governs with 1° of margin.
    expect(finding.margin).toBeCloseTo(1, 9);
  });

  it('fails: pinion pointing 1.5° down gives a 4.5° difference', () => {
    // Derived: rear = |−1.5 − 4.5886| = 6.0886°, front 1.5886°, difference 4.5°.
    const finding = run(specWith((s) => (s.chassis.pinion.angleDeg = -1.5)));
    expect(finding.status).toBe('fails');
    expect(finding.measured).toBeCloseTo(4.5, 9);
    expect(finding.required).toBe(1);
    expect(finding.remedies[0]).toMatchObject({ kind: 'fabrication', laborHours: 1.5 });
  });

  it('tight: equal joints at 3.4° run, but not vibration-free above 3°', () => {
    // Derived: pinion and tilt both 1.1886° with a 4.5886° shaft gives 3.4° at each joint;
    // 3870.6 rpm at the shaft allows 4.41° (interpolated between 3500 and 4000 rpm).
    const finding = run(
      specWith((s) => {
        s.chassis.pinion.angleDeg = 1.1886;
        s.placement.tiltDeg = 1.1886;
        // Keep the shaft line where it was: move the pinion with the output.
        const c = Math.cos((1.1886 * Math.PI) / 180);
        const sn = Math.sin((1.1886 * Math.PI) / 180);
        const dx = 1000 + 700 * c - (1000 + 700 * Math.cos((3 * Math.PI) / 180));
        const dz = 600 - 700 * sn - (600 - 700 * Math.sin((3 * Math.PI) / 180));
        s.chassis.pinion.x = FIXTURE_PINION.x + dx;
        s.chassis.pinion.z = FIXTURE_PINION.z + dz;
      }),
    );
    expect(finding.status).toBe('tight');
    expect(finding.message).toContain('not run vibration-free');
  });

  it('fails below the 1/2° minimum: shaft in line with the crank, pinion parallel', () => {
    // Derived: pinion on the crank line 1270 mm behind the output → both joints 0°.
    const level = run(specWith((s) => {
      const t = (3 * Math.PI) / 180;
      s.chassis.pinion.x = 1000 + 700 * Math.cos(t) + 1270 * Math.cos(t);
      s.chassis.pinion.z = 600 - 700 * Math.sin(t) - 1270 * Math.sin(t);
    }));
    expect(level).toMatchObject({ status: 'fails', limit: 'min', required: 0.5 });
    expect(level.measured).toBeCloseTo(0, 9);
  });

  it('fails at high shaft speed where the allowed angle is small', () => {
    // Derived: no road-speed figures → 5500 / 0.70 = 7857 rpm; the table's last slope gives 0.5° (floored) < 1.59°.
    const finding = run(specWith((s) => delete s.goals.topSpeedKph));
    expect(finding.status).toBe('fails');
    expect(finding.message).toContain('rev limit in top gear');
  });

  it('unknown without a transmission', () => {
    expect(run(specWith((s) => delete s.transmission))).toMatchObject({ status: 'unknown', missing: ['transmission'] });
  });
});
