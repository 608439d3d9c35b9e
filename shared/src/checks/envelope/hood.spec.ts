import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { HOOD_CHECK } from './hood';

// Box fixture: top profile peaks at (u 300, w 450) → (700, 950); flat hood underside at z 1000.
describe('envelope.hood', () => {
  it('ok: 50 mm under the hood', () => {
    const f = runCheck(HOOD_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(50, 9);
    expect(f.status).toBe('ok');
  });
  it('tight (required 46), fails (required 60) with a lowering of the shortfall', () => {
    expect(runCheck(HOOD_CHECK, boxFitSpec(), { minHoodGapMm: 46 }).status).toBe('tight');
    const f = runCheck(HOOD_CHECK, boxFitSpec(), { minHoodGapMm: 60 });
    expect(f.status).toBe('fails');
    expect(f.remedies).toContainEqual(expect.objectContaining({ kind: 'placement', axis: 'height', changeBy: -10 }));
  });
  it('overlap: z_e 570 puts the top 20 mm through the hood line', () => {
    expect(runCheck(HOOD_CHECK, boxFitSpec({ heightMm: 570 })).measured).toBeCloseTo(-20, 9);
  });
  it('tilt 3°: the highest placed vertex', () => {
    // Derived: (300, 450): z = 500 + 300·sin 3° + 450·cos 3° = 500 + 15.701 + 449.384 = 965.085 → 34.915;
    // (500, 420): 500 + 26.168 + 419.425 = 945.593 → 54.407. The smaller is 34.915.
    const f = runCheck(HOOD_CHECK, boxFitSpec({ tiltDeg: 3 }));
    expect(f.measured).toBeCloseTo(1000 - (500 + 300 * SIN3 + 450 * COS3), 9);
  });
  it('interpolates the hood line and checks its vertices against the profile', () => {
    const spec = boxFitSpec();
    // Derived: the hood dips to 960 at x 800. At its vertex the profile between (900, 900) and (700, 950) is at
    // 925 → 35; at the profile peak x 700 the hood is 1000 − 40·700/800 = 965 → 15. The smaller is 15, at x 700.
    const f = runCheck(HOOD_CHECK, { ...spec, chassis: { ...spec.chassis, hoodLine: [ { x: 0, z: 1000 }, { x: 800, z: 960 }, { x: 1500, z: 1000 } ] } });
    expect(f.measured).toBeCloseTo(15, 9);
    // A sharp dip between profile vertices is found at the hood vertex: 930 at x 800 over the profile's 925 → 5.
    const dip = runCheck(HOOD_CHECK, { ...spec, chassis: { ...spec.chassis, hoodLine: [ { x: 0, z: 1000 }, { x: 790, z: 1000 }, { x: 800, z: 930 }, { x: 810, z: 1000 }, { x: 1500, z: 1000 } ] } });
    expect(dip.measured).toBeCloseTo(5, 9);
  });
  it('unknown without a hood line or a top profile', () => {
    const spec = boxFitSpec();
    expect(runCheck(HOOD_CHECK, { ...spec, chassis: { ...spec.chassis, hoodLine: [] } }).missing).toEqual(['chassis.hoodLine']);
    expect(runCheck(HOOD_CHECK, { ...spec, engine: { ...spec.engine, topProfile: [] } }).missing).toEqual(['engine.topProfile']);
  });
});
