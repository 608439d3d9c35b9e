import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { runCheck } from '../../fixtures/check-test-helpers';
import { SUMP_STEERING_CHECK } from './sump-steering-linkage';

// Box fixture: pan front-bottom corner at (500, z_e − 200); drag link top-rear corner at (470, 290).
describe('envelope.sump-steering-linkage', () => {
  it('ok: corner to corner distance', () => {
    // Derived: √((500 − 470)² + (300 − 290)²) = √1000 = 31.623; margin 18.923.
    const f = runCheck(SUMP_STEERING_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(Math.sqrt(1000), 9);
    expect(f.status).toBe('ok');
    expect(f.against).toBe('link');
  });
  it('tight and fails come from the required gap', () => {
    // Derived: required 28 → margin 3.623 (tight); required 35 → −3.377 (fails).
    expect(runCheck(SUMP_STEERING_CHECK, boxFitSpec(), { minGapBelowMm: 28 }).status).toBe('tight');
    const f = runCheck(SUMP_STEERING_CHECK, boxFitSpec(), { minGapBelowMm: 35 });
    expect(f.status).toBe('fails');
    expect(f.margin).toBeCloseTo(Math.sqrt(1000) - 35, 9);
    expect(f.remedies.some((r) => r.kind === 'fabrication' && r.laborHours === 5)).toBe(true);
  });
  it('overlap: z_e 480 puts the pan corner 10 mm into the link top (x 500 is outside the link, so it is the lift at x 470)', () => {
    // Derived: moved 30 mm rearward (setback 970) the pan spans x 470–870; its floor at z 280 (z_e 480) overlaps the
    // link top z 290 over x 470 only at one edge (touch), so use setback 960: floor over x 460–470 sits 290 − 280 = 10 mm low.
    const f = runCheck(SUMP_STEERING_CHECK, boxFitSpec({ setbackMm: 960, heightMm: 480 }));
    expect(f.measured).toBeCloseTo(-10, 9);
  });
  it('unknown without a steering linkage obstacle', () => {
    const spec = boxFitSpec();
    const f = runCheck(SUMP_STEERING_CHECK, { ...spec, chassis: { ...spec.chassis, obstacles: spec.chassis.obstacles.filter((o) => o.kind !== 'steering-linkage') } });
    expect(f.status).toBe('unknown');
    expect(f.missing).toEqual(['chassis.obstacles (kind steering-linkage)']);
  });
});
