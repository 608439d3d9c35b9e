import { boxFitSpec } from '../../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../../fixtures/check-test-helpers';
import { DEMO_FIT_SPEC } from '../../fixtures/demo-fit-spec';
import type { PartRemedy } from '../../types/finding';
import type { FitSpec, MountAdapterSpec } from '../../types/fit-spec';
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
  it('blocked without a chosen adapter: the sentence says it does not bolt up and offers the adapter, never that it is covered', () => {
    // Common practice (no published source): a mount offset past the slotted-hole tolerance needs an adapter
    // or brackets before the engine bolts down. Derived: 25.377 − 3 = 22.377 mm over the tolerance.
    const f = runCheck(ENGINE_MOUNT_RIGHT_CHECK, boxFitSpec());
    expect(f.status).toBe('fails');
    expect(f.message).toMatch(/25\.4 mm \(1\.00 in\) in all, 22\.4 mm \(0\.88 in\) more than the 3\.0 mm \(0\.12 in\) the mounts take up, so it does not bolt up directly/);
    expect(f.message).toMatch(/choose a mount adapter: the catalog's Fitting adapter would cover that offset\.$/);
    expect(f.message).not.toMatch(/\bcovers that offset/);
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

  describe('with a chosen adapter', () => {
    const ROOMY: MountAdapterSpec = { id: 'adapter-roomy', name: 'Roomy adapter', maxDxMm: 30, maxDzMm: 40, maxDyMm: 30, price: 150 };
    function chosen(mountAdapterId: string, extra: MountAdapterSpec[] = []): FitSpec {
      const spec = boxFitSpec();
      return { ...spec, mountAdapterId, candidates: { ...spec.candidates, mountAdapters: [...(spec.candidates?.mountAdapters ?? []), ...extra] } };
    }

    it('ok: the roomy adapter covers every axis with more than the tight band to spare', () => {
      // Derived: right offset |dx| 10, |dz| 20, |dy| 12; slack 30 − 10 = 20, 40 − 20 = 20, 30 − 12 = 18; tightest dy: 18 ≥ 6 → ok.
      const f = runCheck(ENGINE_MOUNT_RIGHT_CHECK, chosen('adapter-roomy', [ROOMY]));
      expect(f).toMatchObject({ status: 'ok', measured: 12, required: 30, margin: 18, limit: 'max', remedies: [] });
      expect(f.message).toMatch(/^The chosen adapter Roomy adapter takes up the right offset/);
      expect(f.message).toMatch(/tightest sideways: 18\.0 mm \(0\.71 in\) to spare/);
    });

    it('tight: within the tight band of the sideways reach; only a roomier adapter is offered', () => {
      // Derived: 15/25/15 adapter: slack 15 − 10 = 5, 25 − 20 = 5, 15 − 12 = 3; tightest dy: 0 ≤ 3 < 6 → tight.
      const f = runCheck(ENGINE_MOUNT_RIGHT_CHECK, chosen('adapter-fits'));
      expect(f).toMatchObject({ status: 'tight', measured: 12, required: 15, margin: 3, remedies: [] });
      expect(f.message).toMatch(/takes up the right offset/);
      expect(f.message).toMatch(/3\.0 mm \(0\.12 in\) to spare/);
      const withRoomy = runCheck(ENGINE_MOUNT_RIGHT_CHECK, chosen('adapter-fits', [ROOMY]));
      expect(withRoomy.status).toBe('tight');
      expect(withRoomy.remedies).toHaveLength(1);
      expect(withRoomy.remedies[0]).toMatchObject({ kind: 'part', category: 'mount-adapter', partIds: ['adapter-roomy'] });
    });

    it('fails when the chosen adapter is too small, naming the axis, with the existing remedies', () => {
      // Derived: 5/5/5 adapter: slack 5 − 10 = −5, 5 − 20 = −15, 5 − 12 = −7; worst dz: 20 mm is 15 mm past 5 mm.
      const f = runCheck(ENGINE_MOUNT_RIGHT_CHECK, chosen('adapter-small'));
      expect(f).toMatchObject({ status: 'fails', measured: 20, required: 5, margin: -15 });
      expect(f.message).toMatch(/does not cover the right offset: the vertical offset of 20\.0 mm \(0\.79 in\) is 15\.0 mm \(0\.59 in\) past its 5\.0 mm \(0\.20 in\) reach/);
      expect(f.remedies[0]).toMatchObject({ kind: 'part', category: 'mount-adapter', partIds: ['adapter-fits'] });
      expect(f.remedies[1]).toMatchObject({ kind: 'fabrication', laborHours: 6 });
    });

    it('unknown when the chosen adapter is not among the candidates', () => {
      const f = runCheck(ENGINE_MOUNT_LEFT_CHECK, chosen('adapter-gone'));
      expect(f.status).toBe('unknown');
      expect(f.missing).toEqual(['mountAdapter']);
      expect(f.message).toMatch(/"adapter-gone"/);
    });

    it('demo: the chosen SW-60 plates take up the offset, tight sideways; the SW-40 fails sideways', () => {
      // Derived: dy = 305 − 250 = 55 on both sides; SW-60 reach 60 → slack 5 < 6 → tight (dx ≈ 11.6 of 25, dz ≈ 38.9 of 50 leave more).
      const sw60 = runCheck(ENGINE_MOUNT_LEFT_CHECK, { ...DEMO_FIT_SPEC, mountAdapterId: 'mnt-sw-60' });
      expect(sw60).toMatchObject({ status: 'tight', required: 60 });
      expect(sw60.measured).toBeCloseTo(55, 9);
      expect(sw60.margin).toBeCloseTo(5, 9);
      expect((sw60.remedies[0] as PartRemedy).partIds).toEqual(['mnt-sw-90']);
      // Derived: SW-40 reach 40 sideways → 40 − 55 = −15, worse than vertical 30 − 38.9 = −8.9.
      const sw40 = runCheck(ENGINE_MOUNT_RIGHT_CHECK, { ...DEMO_FIT_SPEC, mountAdapterId: 'mnt-sw-40' });
      expect(sw40.status).toBe('fails');
      expect(sw40.margin).toBeCloseTo(-15, 9);
      expect(sw40.message).toMatch(/the sideways offset of 55\.0 mm/);
    });
  });
});
