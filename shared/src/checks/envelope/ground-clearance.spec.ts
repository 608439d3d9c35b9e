import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { GROUND_CLEARANCE_CHECK } from './ground-clearance';

describe('envelope.ground-clearance', () => {
  it('ok: the pan floor at z_e − 200 = 300', () => {
    const f = runCheck(GROUND_CLEARANCE_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(300, 9);
    expect(f.required).toBe(100);
    expect(f.status).toBe('ok');
  });
  it('tight (required 296) and fails (required 320) with a raise of exactly the shortfall', () => {
    expect(runCheck(GROUND_CLEARANCE_CHECK, boxFitSpec(), { minGroundClearanceMm: 296 }).status).toBe('tight');
    const f = runCheck(GROUND_CLEARANCE_CHECK, boxFitSpec(), { minGroundClearanceMm: 320 });
    expect(f.status).toBe('fails');
    expect(f.remedies).toContainEqual(expect.objectContaining({ kind: 'placement', axis: 'height', changeBy: 20 }));
  });
  it('tilt 3°: the rear-bottom corner is lowest', () => {
    // Derived: (u 100, w −200): z = 500 + 100·sin 3° − 200·cos 3° = 500 + 5.234 − 199.726 = 305.508.
    const f = runCheck(GROUND_CLEARANCE_CHECK, boxFitSpec({ tiltDeg: 3 }));
    expect(f.measured).toBeCloseTo(500 + 100 * SIN3 - 200 * COS3, 9);
    expect(f.measured).toBeCloseTo(305.508, 3);
  });
  it('unknown without a pan', () => {
    expect(runCheck(GROUND_CLEARANCE_CHECK, { ...boxFitSpec(), oilPan: undefined }).missing).toEqual(['oilPan.bottomProfile']);
  });
});
