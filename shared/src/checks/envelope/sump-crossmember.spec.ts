import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN } from '../../fixtures/demo-fit-spec';
import type { PartRemedy, PlacementRemedy } from '../../types/finding';
import { SUMP_CROSSMEMBER_CHECK } from './sump-crossmember';

// Box fixture: pan bottom at z = z_e − 200 over x 500–900, crossmember top at z 280 over x 600–700.
// Rule (DEFAULT_FIT_SETTINGS): gap ≥ 12.7 mm, tight within 6 mm.
describe('envelope.sump-crossmember', () => {
  it('ok: 20 mm above the crossmember (z_e 500)', () => {
    // Derived: pan bottom 500 − 200 = 300; 300 − 280 = 20; margin 20 − 12.7 = 7.3 ≥ 6.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec());
    expect(f.status).toBe('ok');
    expect(f.measured).toBeCloseTo(20, 9);
    expect(f.required).toBe(12.7);
    expect(f.margin).toBeCloseTo(7.3, 9);
    expect(f.against).toBe('xm');
    expect(f.unit).toBe('mm');
    expect(f.remedies).toEqual([]);
    expect(f.message).toContain('20.0 mm (0.79 in)');
  });

  it('tight: 14 mm (z_e 494)', () => {
    // Derived: 494 − 200 − 280 = 14; margin 1.3 < 6.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec({ heightMm: 494 }));
    expect(f.status).toBe('tight');
    expect(f.margin).toBeCloseTo(1.3, 9);
    const raise = f.remedies.find((r): r is PlacementRemedy => r.kind === 'placement' && r.axis === 'height');
    // Tight is brought to the edge of the tight band: 6 − 1.3 = 4.7 mm.
    expect(raise?.changeBy).toBeCloseTo(4.7, 1);
  });

  it('fails: 10 mm (z_e 490), remedies name the candidate pan, the raise and a fabrication', () => {
    // Derived: 490 − 200 − 280 = 10; margin −2.7.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec({ heightMm: 490 }));
    expect(f.status).toBe('fails');
    expect(f.margin).toBeCloseTo(-2.7, 9);
    const part = f.remedies.find((r): r is PartRemedy => r.kind === 'part');
    // The shallow pan (floor w −150): 490 − 150 − 280 = 60 mm, clears.
    expect(part?.partIds).toEqual(['box-pan-shallow']);
    expect(part?.requires.railPattern).toBe('BOX');
    const raise = f.remedies.find((r): r is PlacementRemedy => r.kind === 'placement' && r.axis === 'height');
    // Vertical contact: the raise equals the shortfall, 2.7 mm.
    expect(raise?.changeBy).toBeCloseTo(2.7, 1);
    const fab = f.remedies.find((r) => r.kind === 'fabrication');
    expect(fab && fab.kind === 'fabrication' && fab.laborHours).toBe(8);
  });

  it('overlap: negative gap equals minus the vertical lift (z_e 450)', () => {
    // Derived: pan bottom 450 − 200 = 250 sits 280 − 250 = 30 mm into the crossmember → gap −30.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec({ heightMm: 450 }));
    expect(f.measured).toBeCloseTo(-30, 9);
    expect(f.margin).toBeCloseTo(-42.7, 9);
    expect(f.message).toMatch(/30\.0 mm \(1\.18 in\) into/);
  });

  it('tilt 3°: distance to the sloping pan floor', () => {
    // Derived (x = x_e − u·cosθ + w·sinθ, z = z_e + u·sinθ + w·cosθ, θ = 3°):
    // front-bottom corner (u 500, w −200): x = 1000 − 500·0.998630 − 200·0.052336 = 490.218, z = 500 + 26.168 − 199.726 = 326.442;
    // the floor falls rearward with slope tan 3°; at the crossmember's rear-top corner x 700 it is at
    // 326.442 − (700 − 490.218)·tan 3° = 315.448, i.e. 35.448 mm above it vertically, and the perpendicular
    // distance from the corner to the floor is 35.448·cos 3° = 35.399 mm.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec({ tiltDeg: 3 }));
    const zFront = 500 + 500 * SIN3 - 200 * COS3;
    const xFront = 1000 - 500 * COS3 - 200 * SIN3;
    const vertical = zFront - (700 - xFront) * Math.tan((3 * Math.PI) / 180) - 280;
    expect(vertical).toBeCloseTo(35.448, 3);
    expect(f.measured).toBeCloseTo(vertical * COS3, 9);
    expect(f.status).toBe('ok');
  });

  it('tilt 3° overlap: the lift is taken where the floor is lowest over the crossmember', () => {
    // Derived: at z_e 450 the floor over x 700 is at 315.448 − 50 = 265.448, 280 − 265.448 = 14.552 mm below
    // the crossmember top, and higher further forward: lifting 14.552 mm separates them.
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, boxFitSpec({ heightMm: 450, tiltDeg: 3 }));
    const zFront = 450 + 500 * SIN3 - 200 * COS3;
    const xFront = 1000 - 500 * COS3 - 200 * SIN3;
    const lift = 280 - (zFront - (700 - xFront) * Math.tan((3 * Math.PI) / 180));
    expect(lift).toBeCloseTo(14.552, 3);
    expect(f.measured).toBeCloseTo(-lift, 9);
  });

  it('unknown: names the missing inputs', () => {
    const spec = boxFitSpec();
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, { ...spec, oilPan: undefined, chassis: { ...spec.chassis, obstacles: [] } });
    expect(f.status).toBe('unknown');
    expect(f.measured).toBeNull();
    expect(f.missing).toEqual(['oilPan.bottomProfile', 'chassis.obstacles (kind crossmember)']);
  });

  it('demo: the stock front-sump pan fails and the rear-sump pan is offered because it clears in the same placement', () => {
    const f = runCheck(SUMP_CROSSMEMBER_CHECK, DEMO_FIT_SPEC);
    expect(f.status).toBe('fails');
    expect(f.against).toBe('front-crossmember');
    const part = f.remedies[0] as PartRemedy;
    expect(part).toMatchObject({ kind: 'part', category: 'oil-pan', requires: { sumpPosition: 'rear', railPattern: 'CV-V8' } });
    expect(part.partIds).toEqual([DEMO_REAR_SUMP_PAN.id]);
    const withIt = runCheck(SUMP_CROSSMEMBER_CHECK, { ...DEMO_FIT_SPEC, oilPan: DEMO_REAR_SUMP_PAN });
    expect(withIt.status).toBe('ok');
    expect(f.remedies[0].kind).toBe('part');
    expect(f.remedies.some((r) => r.kind === 'placement' && r.axis === 'height' && r.changeBy > 0)).toBe(true);
    expect(f.remedies[f.remedies.length - 1].kind).toBe('fabrication');
  });
});
