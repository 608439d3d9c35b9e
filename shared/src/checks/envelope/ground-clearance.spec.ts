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
  it('the lowest of everything placed sets it: a bellhousing hanging below the pan is named', () => {
    // Derived from the box fixture: a transmission corner at (u −100, w −260) sits at z = 500 − 260 = 240,
    // below the pan floor at z 300, so 240 is the ground clearance and the bellhousing or case is named.
    const spec = boxFitSpec();
    spec.transmission!.sideProfile = [
      { u: 0, w: 200 },
      { u: -600, w: 200 },
      { u: -600, w: -150 },
      { u: -100, w: -260 },
      { u: 0, w: -150 },
    ];
    const f = runCheck(GROUND_CLEARANCE_CHECK, spec, { minGroundClearanceMm: 250 });
    expect(f.measured).toBeCloseTo(240, 9);
    expect(f.message).toContain('bellhousing or transmission case');
    expect(f.status).toBe('fails');
    // A shallower pan would not help: only the raise is offered.
    expect(f.remedies.map((r) => r.kind)).toEqual(['placement']);
    expect(f.remedies[0]).toMatchObject({ axis: 'height', changeBy: 10 });
  });
});

