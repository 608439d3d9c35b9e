import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { checkDriveshaftLength, DRIVESHAFT_LENGTH_CHECK } from './driveshaft-length';
import { drivelineLayout } from './driveline-layout';
import { specWith, systemFitSpec } from './system-spec.fixture';

const run = (spec: FitSpec) => checkDriveshaftLength({ spec, settings: DEFAULT_FIT_SETTINGS });

describe('drivetrain.driveshaft-length', () => {
  it('measures 50.0 in to the pinion on the fixture', () => {
    // Derived: the fixture's pinion is √(50² − 4²) in behind and 4 in below the output.
    const layout = drivelineLayout(systemFitSpec());
    expect(layout.ok && layout.layout.line.lengthMm).toBeCloseTo(1270, 9);
    expect(DRIVESHAFT_LENGTH_CHECK.dependsOnPlacement).toBe(true);
  });

  it('ok: a new shaft keeps all 60 mm of travel', () => {
    // Derived: 60 − 25.4 = 34.6 mm margin.
    const finding = run(systemFitSpec());
    expect(finding).toMatchObject({ status: 'ok', measured: 60, required: 25.4, unit: 'mm' });
    expect(finding.margin).toBeCloseTo(34.6, 9);
    expect(finding.message).toContain('1270.0 mm (50.00 in)');
  });

  it('tight: growth leaves 30 mm', () => {
    // Derived: 60 − 30 = 30 mm left, 4.6 mm over the minimum, inside the 6 mm band.
    const finding = run(specWith((s) => (s.driveshaft!.suspensionGrowthMm = 30)));
    expect(finding.status).toBe('tight');
    expect(finding.margin).toBeCloseTo(4.6, 9);
  });

  it('fails: an existing shaft 20 mm short plus 25 mm growth', () => {
    // Derived: 60 − 20 − 25 = 15 mm left, 10.4 mm short of 25.4.
    const finding = run(specWith((s) => Object.assign(s.driveshaft!, { lengthMm: 1250, suspensionGrowthMm: 25 })));
    expect(finding.status).toBe('fails');
    expect(finding.measured).toBeCloseTo(15, 9);
    expect(finding.remedies[0]).toMatchObject({ category: 'driveshaft', requires: { lengthMm: 1270 } });
  });

  it('a bellhousing adapter shortens the shaft by its thickness (nearly, at 4.6° shaft angle)', () => {
    const plain = drivelineLayout(systemFitSpec());
    const adapted = drivelineLayout(specWith((s) => (s.transmission!.bellPattern = 'bell-b')));
    expect(plain.ok && adapted.ok).toBe(true);
    if (plain.ok && adapted.ok) {
      expect(adapted.layout.adapter?.id).toBe('adapter-thin');
      expect(plain.layout.line.lengthMm - adapted.layout.line.lengthMm).toBeGreaterThan(12.5);
      expect(plain.layout.line.lengthMm - adapted.layout.line.lengthMm).toBeLessThan(12.7);
    }
  });

  it('unknown without a transmission', () => {
    expect(run(specWith((s) => delete s.transmission))).toMatchObject({ status: 'unknown', missing: ['transmission'], measured: null });
  });
});
