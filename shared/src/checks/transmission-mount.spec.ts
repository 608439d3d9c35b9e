import { boxFitSpec } from '../fixtures/box-fit-spec';
import { COS3, runCheck, SIN3 } from '../fixtures/check-test-helpers';
import { TRANSMISSION_MOUNT_HEIGHT_CHECK, TRANSMISSION_MOUNT_POSITION_CHECK } from './transmission-mount';

// Box fixture: mount (u −500, w −150) → x 1500, z 350; crossmember x 1520 ± 30, z 350.
const withCrossmember = (x: number, z: number, adjustableXMm = 30) => {
  const spec = boxFitSpec();
  return { ...spec, chassis: { ...spec.chassis, transmissionCrossmember: { x, z, adjustableXMm } } };
};

describe('drivetrain.transmission-mount-position', () => {
  it('ok: 20 mm inside ±30', () => {
    const f = runCheck(TRANSMISSION_MOUNT_POSITION_CHECK, boxFitSpec());
    expect(f.measured).toBeCloseTo(20, 9);
    expect(f.margin).toBeCloseTo(10, 9);
    expect(f.status).toBe('ok');
  });
  it('tight (27 of 30) and fails (40 of 30) with a relocation', () => {
    expect(runCheck(TRANSMISSION_MOUNT_POSITION_CHECK, withCrossmember(1527, 350)).status).toBe('tight');
    const f = runCheck(TRANSMISSION_MOUNT_POSITION_CHECK, withCrossmember(1540, 350));
    expect(f.status).toBe('fails');
    expect(f.remedies[0]).toMatchObject({ kind: 'fabrication', laborHours: 4 });
  });
  it('tilt 3°', () => {
    // Derived: x = 1000 + 500·cos 3° − 150·sin 3° = 1491.466 → 28.534 from 1520.
    expect(runCheck(TRANSMISSION_MOUNT_POSITION_CHECK, boxFitSpec({ tiltDeg: 3 })).measured).toBeCloseTo(1520 - (1000 + 500 * COS3 - 150 * SIN3), 9);
  });
  it('unknown without a transmission', () => {
    expect(runCheck(TRANSMISSION_MOUNT_POSITION_CHECK, { ...boxFitSpec(), transmission: undefined }).missing).toEqual(['transmission']);
  });
});

describe('drivetrain.transmission-mount-height', () => {
  it('ok: level with the crossmember', () => {
    expect(runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, boxFitSpec()).status).toBe('ok');
  });
  it('10 mm above: a spacer; 40 mm above or 10 mm below: crossmember work', () => {
    const spacer = runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, withCrossmember(1520, 340));
    expect(spacer.status).toBe('fails');
    expect(spacer.remedies[0]).toMatchObject({ kind: 'part', category: 'transmission-mount', requires: { spacerMm: 10 } });
    expect(runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, withCrossmember(1520, 310)).remedies.map((r) => r.kind)).toEqual(['fabrication']);
    const below = runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, withCrossmember(1520, 360));
    expect(below.measured).toBeCloseTo(10, 9);
    expect(below.message).toMatch(/sits 10\.0 mm \(0\.39 in\) below the crossmember pad, past the ±3\.0 mm \(0\.12 in\) it bolts down within/);
    expect(below.remedies.map((r) => r.kind)).toEqual(['fabrication']);
  });
  it('names the transmission crossmember in every height remedy (the front crossmember is another member)', () => {
    const operations = [340, 310, 360].flatMap((z) => runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, withCrossmember(1520, z)).remedies.flatMap((r) => (r.kind === 'fabrication' ? [r.operation] : [])));
    expect(operations).toEqual([
      "Raise the transmission crossmember's mount pad",
      "Raise the transmission crossmember's pad 40.0 mm (1.57 in)",
      'Drop the transmission crossmember 10.0 mm (0.39 in), or fit a drop crossmember',
    ]);
  });
  it('a band either side of level: the figure is the size of the offset, so "found" is past "at most" exactly when it fails', () => {
    // Common practice (no published source): a mount within the shop's direct-fit tolerance of level, above or
    // below, bolts down; the fixture's mount sits at z 350, so a crossmember at 350 − dz puts it dz above the pad.
    for (const dz of [-600, -10, -3, -2, 0, 2, 3, 10, 40]) {
      const f = runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, withCrossmember(1520, 350 - dz));
      expect(f.limit).toBe('max');
      expect(f.measured).toBeCloseTo(Math.abs(dz), 9);
      expect(f.required).toBe(3);
      expect(f.margin).toBeCloseTo(3 - Math.abs(dz), 9);
      expect(f.status === 'fails').toBe(f.measured! > f.required!);
      if (dz !== 0) expect(f.message).toContain(dz > 0 ? 'above the crossmember pad' : 'below the crossmember pad');
    }
  });
  it('unknown without a transmission', () => {
    expect(runCheck(TRANSMISSION_MOUNT_HEIGHT_CHECK, { ...boxFitSpec(), transmission: undefined }).status).toBe('unknown');
  });
});
