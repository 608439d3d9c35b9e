import { DEFAULT_FIT_SETTINGS } from '../../settings/fit-settings';
import type { FitSpec } from '../../types/fit-spec';
import { specWith, systemFitSpec } from '../drivetrain/system-spec.fixture';
import { checkSerpentineBelt } from './serpentine-belt';

const run = (spec: FitSpec) => checkSerpentineBelt({ spec, settings: DEFAULT_FIT_SETTINGS });
const idler = (w: number) => ({ id: 'idler', role: 'idler' as const, v: 0, w, diameterMm: 70, side: 'back' as const });

describe('belt.serpentine-length', () => {
  it('ok: case A needs 1223.36 mm, the 1225 mm stock belt fits the take-up', () => {
    // Derived: serpentine case A (crank r 80, water pump r 50, alternator r 30) totals 1223.3626 mm;
    // take-up 10 mm shorter to 15 mm longer → 1213.4–1238.4 mm.
    const finding = run(systemFitSpec());
    expect(finding).toMatchObject({ status: 'ok', measured: 1225 });
    expect(finding.required).toBeCloseTo(1223.3626, 4);
    expect(finding.margin).toBeCloseTo(11.6374, 4);
    // Source: ISO 9982:2019 designation, ribs × PK × effective length.
    expect(finding.message).toContain('6PK1223');
    expect(finding.message).toContain('6PK1225');
  });

  it('case B with the back-side idler needs 1227.67 mm', () => {
    // Derived: serpentine case B totals 1227.6727 mm.
    const finding = run(specWith((s) => s.engine.accessoryDrives[0].pulleys.splice(2, 0, idler(300))));
    expect(finding.required).toBeCloseTo(1227.6727, 4);
    expect(finding.measured).toBe(1225);
  });

  it('tight near the end of the take-up, fails outside it', () => {
    expect(run(specWith((s) => (s.candidates!.stockBeltLengthsMm = [1215]))).status).toBe('tight');
    const finding = run(specWith((s) => (s.candidates!.stockBeltLengthsMm = [1180, 1260])));
    expect(finding.status).toBe('fails');
    expect(finding.remedies[0]).toMatchObject({ category: 'belt', requires: { ribs: 6, minLengthMm: 1214, maxLengthMm: 1238 } });
  });

  it('fails for a layout that cannot be computed (idler clear of the run)', () => {
    const finding = run(specWith((s) => s.engine.accessoryDrives[0].pulleys.splice(2, 0, idler(330))));
    expect(finding.status).toBe('fails');
    expect(finding.message).toContain('does not press on the belt');
  });

  it('tight when a pulley is under the 45 mm PK minimum', () => {
    // Source: ISO 9981:2020, PK pulleys: minimum effective diameter 45 mm.
    const finding = run(specWith((s) => {
      const alternator = s.engine.accessoryDrives[0].pulleys[2];
      alternator.diameterMm = 40;
      s.candidates!.stockBeltLengthsMm = [1210];
    }));
    expect(finding.status).toBe('tight');
    expect(finding.message).toContain('alternator');
  });

  it('unknown without stock lengths (still giving the length) or without a drive', () => {
    const noStock = run(specWith((s) => delete s.candidates!.stockBeltLengthsMm));
    expect(noStock).toMatchObject({ status: 'unknown', missing: ['candidates.stockBeltLengthsMm'] });
    expect(noStock.message).toContain('6PK1223');
    expect(run(specWith((s) => (s.accessoryDriveId = 'nope')))).toMatchObject({ status: 'unknown', missing: ['accessoryDrive'] });
  });
});
