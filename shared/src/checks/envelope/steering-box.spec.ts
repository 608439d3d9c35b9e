import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { runCheck } from '../../fixtures/check-test-helpers';
import { STEERING_BOX_CHECK } from './steering-box';

// Box fixture: steering box on the left, inboard face y −340, x −100…400, z 400…600; the drive
// (half width left 280, x 320–500, z 400–800) is beside it.
describe('envelope.steering-box', () => {
  it('ok: 340 − 280 = 60 mm', () => {
    const f = runCheck(STEERING_BOX_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(60, 9);
    expect(f.status).toBe('ok');
  });
  it('tight and fails', () => {
    expect(runCheck(STEERING_BOX_CHECK, boxFitSpec(), { minSteeringBoxGapMm: 56 }).status).toBe('tight');
    expect(runCheck(STEERING_BOX_CHECK, boxFitSpec(), { minSteeringBoxGapMm: 65 }).status).toBe('fails');
  });
  it('a box on the right uses the right half width; nothing beside it is ok without figures', () => {
    const spec = boxFitSpec();
    const right = { ...spec, chassis: { ...spec.chassis, steeringBox: { ...spec.chassis.steeringBox!, side: 'right' as const, inboardY: 300 } } };
    expect(runCheck(STEERING_BOX_CHECK, right).measured).toBeCloseTo(10, 9);
    const behind = { ...spec, chassis: { ...spec.chassis, steeringBox: { ...spec.chassis.steeringBox!, xFrom: -300, xTo: -200 } } };
    expect(runCheck(STEERING_BOX_CHECK, behind).measured).toBeNull();
  });
  it('unknown without a steering box', () => {
    const spec = boxFitSpec();
    expect(runCheck(STEERING_BOX_CHECK, { ...spec, chassis: { ...spec.chassis, steeringBox: undefined } }).missing).toEqual(['chassis.steeringBox']);
  });
});
