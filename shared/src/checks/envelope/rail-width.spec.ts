import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { runCheck } from '../../fixtures/check-test-helpers';
import { RAIL_WIDTH_CHECK } from './rail-width';

// Box fixture: exhaust half width 300 over x 500–900, z 480–600; drive half widths 280/290 over x 320–500,
// z 400–800; rails 700 apart inside, z 400–520.
describe('envelope.rail-width', () => {
  it('ok: the exhaust leaves 350 − 300 = 50 mm to each rail', () => {
    const f = runCheck(RAIL_WIDTH_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(50, 9);
    expect(f.against).toBe('frame-rail-left');
    expect(f.status).toBe('ok');
  });
  it('tight and fails', () => {
    expect(runCheck(RAIL_WIDTH_CHECK, boxFitSpec(), { minRailGapMm: 46 }).status).toBe('tight');
    const f = runCheck(RAIL_WIDTH_CHECK, boxFitSpec(), { minRailGapMm: 55 });
    expect(f.status).toBe('fails');
    expect(f.remedies[0]).toMatchObject({ kind: 'part', category: 'exhaust-manifold' });
  });
  it('interpolates between stations and only counts heights that overlap', () => {
    const spec = boxFitSpec();
    // Derived: widths 700 at x 0 and 800 at x 1000 → 750 at x 500 (exhaust front end) → 375 − 300 = 75;
    // the drive at x 320: 732 → 366 − 290 = 76. The smaller is 75.
    const widening = { ...spec, chassis: { ...spec.chassis, railStations: [
      { x: 0, insideWidthMm: 700, zBottom: 400, zTop: 520 },
      { x: 1000, insideWidthMm: 800, zBottom: 400, zTop: 520 },
    ] } };
    expect(runCheck(RAIL_WIDTH_CHECK, widening).measured).toBeCloseTo(75, 9);
    // Rails below the exhaust (top 470 < 480): only the drive counts → 350 − 290 = 60.
    const low = { ...spec, chassis: { ...spec.chassis, railStations: spec.chassis.railStations.map((s) => ({ ...s, zTop: 470 })) } };
    const f = runCheck(RAIL_WIDTH_CHECK, low);
    expect(f.measured).toBeCloseTo(60, 9);
    expect(f.against).toBe('frame-rail-right');
  });
  it('no feature level with the rails: ok without figures', () => {
    const spec = boxFitSpec();
    const f = runCheck(RAIL_WIDTH_CHECK, { ...spec, chassis: { ...spec.chassis, railStations: spec.chassis.railStations.map((s) => ({ ...s, zBottom: 0, zTop: 100 })) } });
    expect(f.status).toBe('ok');
    expect(f.measured).toBeNull();
  });
  it('overlap (a feature wider than the space): negative gap', () => {
    const spec = boxFitSpec();
    const f = runCheck(RAIL_WIDTH_CHECK, { ...spec, engine: { ...spec.engine, widthFeatures: [{ ...spec.engine.widthFeatures[0], halfWidthRightMm: 362 }] } });
    expect(f.measured).toBeCloseTo(-12, 9);
    expect(f.status).toBe('fails');
  });
  it('unknown without rail stations', () => {
    const spec = boxFitSpec();
    expect(runCheck(RAIL_WIDTH_CHECK, { ...spec, chassis: { ...spec.chassis, railStations: [] } }).missing).toEqual(['chassis.railStations']);
  });
});
