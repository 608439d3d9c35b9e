import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { DEMO_FIT_SPEC } from '../../fixtures/demo-fit-spec';
import type { PartRemedy } from '../../types/finding';
import { ENGINE_MOUNT_LEFT_CHECK, ENGINE_MOUNT_RIGHT_CHECK, mountOffset } from './engine-mounts';

// Box fixture: bosses (u 300, v ∓250, w −100) → x 700, y ∓250, z 400. Left pad (700, −250, 400);
// right pad (710, 262, 380): dx 10, dy 12, dz −20.
describe('mounts.engine-mount-*', () => {
  it('ok: the left boss lands on its pad', () => {
    const f = runCheck(ENGINE_MOUNT_LEFT_CHECK, boxFitSpec());
    expect(f.status).toBe('ok');
    expect(f.measured).toBeCloseTo(0, 9);
    expect(f.limit).toBe('max');
  });
  it('fails with an adapter that covers the offset, and a fabrication option', () => {
    // Derived: √(10² + 12² + 20²) = √644 = 25.377; the 15/25/15 adapter covers it, the 5/5/5 one does not.
    const f = runCheck(ENGINE_MOUNT_RIGHT_CHECK, boxFitSpec());
    expect(f.status).toBe('fails');
    expect(f.measured).toBeCloseTo(Math.sqrt(644), 9);
    expect(f.margin).toBeCloseTo(3 - Math.sqrt(644), 9);
    const part = f.remedies[0] as PartRemedy;
    expect(part).toMatchObject({ kind: 'part', category: 'mount-adapter', partIds: ['adapter-fits'] });
    expect(f.remedies[1]).toMatchObject({ kind: 'fabrication', laborHours: 6 });
  });
  it('within the direct-fit tolerance (2 mm) is ok, past it fails; fabrication only when no adapter covers', () => {
    const spec = boxFitSpec();
    const near = { ...spec, chassis: { ...spec.chassis, mountPads: { ...spec.chassis.mountPads, left: { x: 702, y: -250, z: 400 } } } };
    expect(runCheck(ENGINE_MOUNT_LEFT_CHECK, near).status).toBe('ok');
    const far = { ...spec, chassis: { ...spec.chassis, mountPads: { ...spec.chassis.mountPads, left: { x: 760, y: -250, z: 400 } } } };
    const f = runCheck(ENGINE_MOUNT_LEFT_CHECK, far);
    expect(f.remedies.map((r) => r.kind)).toEqual(['fabrication']);
  });
  it('tilt 3°: the boss moves with the placement formula', () => {
    // Derived: x = 1000 − 300·cos 3° − 100·sin 3° = 694.176, z = 500 + 300·sin 3° − 100·cos 3° = 415.838.
    const o = mountOffset(boxFitSpec({ tiltDeg: 3 }), 'left');
    expect(o.boss.x).toBeCloseTo(1000 - 300 * COS3 - 100 * SIN3, 9);
    expect(o.boss.z).toBeCloseTo(500 + 300 * SIN3 - 100 * COS3, 9);
    expect(o.dz).toBeCloseTo(400 - o.boss.z, 9);
  });
  it('unknown without the pads', () => {
    const spec = boxFitSpec();
    const f = runCheck(ENGINE_MOUNT_LEFT_CHECK, { ...spec, chassis: { ...spec.chassis, mountPads: undefined as never } });
    expect(f.status).toBe('unknown');
    expect(f.missing).toEqual(['chassis.mountPads.left']);
  });
  it('demo: the SW-60 plates bridge the offset (the SW-40 is too small)', () => {
    const f = runCheck(ENGINE_MOUNT_LEFT_CHECK, DEMO_FIT_SPEC);
    expect((f.remedies[0] as PartRemedy).partIds).toEqual(['mnt-sw-60', 'mnt-sw-90']);
  });
});
