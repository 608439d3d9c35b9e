import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { runCheck } from '../../fixtures/check-test-helpers';
import { SUMP_AXLE_CHECK } from './sump-axle';

// Box fixture: axle at bump x 350–420, z 150–260; pan front-bottom corner (500, z_e − 200).
describe('envelope.sump-axle', () => {
  it('ok: √(80² + 40²)', () => {
    const f = runCheck(SUMP_AXLE_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(Math.sqrt(8000), 9);
    expect(f.status).toBe('ok');
  });
  it('tight and fails', () => {
    expect(runCheck(SUMP_AXLE_CHECK, boxFitSpec(), { minGapBelowMm: 85 }).status).toBe('tight');
    const f = runCheck(SUMP_AXLE_CHECK, boxFitSpec(), { minGapBelowMm: 95 });
    expect(f.status).toBe('fails');
    expect(f.remedies.map((r) => r.kind)).toContain('fabrication');
  });
  it('overlap: setback 890 (pan x 390–790) and z_e 440 (floor 240) sit 20 mm into the axle top', () => {
    // Derived: axle top 260 − floor 240 = 20 over x 390–420 → gap −20.
    expect(runCheck(SUMP_AXLE_CHECK, boxFitSpec({ setbackMm: 890, heightMm: 440 })).measured).toBeCloseTo(-20, 9);
  });
  it('differential-at-bump counts too; unknown without either', () => {
    const spec = boxFitSpec();
    const diff = { ...spec, chassis: { ...spec.chassis, obstacles: spec.chassis.obstacles.map((o) => (o.kind === 'axle-at-bump' ? { ...o, kind: 'differential-at-bump' as const } : o)) } };
    expect(runCheck(SUMP_AXLE_CHECK, diff).measured).toBeCloseTo(Math.sqrt(8000), 9);
    const none = { ...spec, chassis: { ...spec.chassis, obstacles: spec.chassis.obstacles.filter((o) => o.kind !== 'axle-at-bump') } };
    expect(runCheck(SUMP_AXLE_CHECK, none).missing).toEqual(['chassis.obstacles (kind axle-at-bump or differential-at-bump)']);
  });
});
