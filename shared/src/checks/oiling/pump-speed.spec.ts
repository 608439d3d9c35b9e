import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith } from '../drivetrain/system-spec.fixture';
import { checkOilPumpSpeed } from './pump-speed';

const run = (spec: FitSpec) => checkOilPumpSpeed({ spec, settings: DEFAULT_FIT_SETTINGS });
const atRevLimit = (rpm: number, change: (spec: FitSpec) => void = () => undefined) =>
  run(specWith((s) => {
    s.goals.revLimitRpm = rpm;
    change(s);
  }));

describe('oiling.pump-speed', () => {
  // Common practice (no published source): a stock pump driven at crank speed is flagged above about 6,000 rpm.
  it('stock crank-driven pump: ok at 5500, tight at 6000, fails at 6500', () => {
    expect(atRevLimit(5500)).toMatchObject({ status: 'ok', measured: 5500, required: 6000 });
    expect(atRevLimit(6000)).toMatchObject({ status: 'tight', margin: 0 });
    const over = atRevLimit(6500);
    expect(over).toMatchObject({ status: 'fails', margin: -500 });
    expect(over.remedies[0]).toMatchObject({ category: 'oil-pump', requires: { minSpeedLimitRpm: 6750, inlet: 'inlet-a' }, partIds: ['pump-hv-a'] });
  });

  it('a cam-driven pump turns at half speed', () => {
    // Common practice (no published source): cam-driven pumps turn at half crank speed.
    expect(atRevLimit(6500, (s) => (s.engine.oilPumpDrive = 'cam'))).toMatchObject({ status: 'ok', measured: 3250 });
  });

  it("uses the pump's own rating when it has one", () => {
    const finding = atRevLimit(7000, (s) => (s.oilPump = s.candidates!.oilPumps![0]));
    expect(finding).toMatchObject({ status: 'ok', required: 7500, margin: 500 });
  });

  it('unknown without a pump', () => {
    expect(run(specWith((s) => delete s.oilPump))).toMatchObject({ status: 'unknown', missing: ['oilPump'] });
  });

  it('not checked without a planned rev limit, saying so', () => {
    // Common practice (no published source): pump speed is crank (or half crank) speed at the rev limit; with no rev limit
    // there is no speed to compare against the pump's rating.
    const finding = run(specWith((s) => delete s.goals.revLimitRpm));
    expect(finding).toMatchObject({ status: 'unknown', missing: ['goals.revLimitRpm'] });
    expect(finding.message).toBe('Cannot check oil pump speed at the rev limit: missing the rev limit.');
  });
});
