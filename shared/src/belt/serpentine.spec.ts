import fc from 'fast-check';
import { serpentineLength, type BeltPulley } from './serpentine';
import { openBeltLengthExact } from './two-pulley';

const crank: BeltPulley = { id: 'crank', x: 0, y: 0, diameter: 160, side: 'grooved' };
const waterPump: BeltPulley = { id: 'water-pump', x: 150, y: 250, diameter: 100, side: 'grooved' };
const alternator: BeltPulley = { id: 'alternator', x: -150, y: 250, diameter: 60, side: 'grooved' };
const idler = (y: number): BeltPulley => ({ id: 'idler', x: 0, y, diameter: 70, side: 'back' });

function layoutOf(pulleys: BeltPulley[]) {
  const result = serpentineLength(pulleys);
  if (!result.ok) throw new Error(result.message);
  return result;
}

describe('serpentine belt length', () => {
  it('case A: three grooved pulleys', () => {
    // Derived: tangent-run and wrap-arc walk of a counter-clockwise loop; total agrees with a brute-force hull perimeter.
    const layout = layoutOf([crank, waterPump, alternator]);
    expect(layout.runs.map((r) => r.length)).toEqual([expect.closeTo(290, 3), expect.closeTo(299.333, 3), expect.closeTo(287.228, 3)]);
    expect(layout.wraps.map((w) => w.wrapDeg)).toEqual([expect.closeTo(133.854, 3), expect.closeTo(118.88, 3), expect.closeTo(107.266, 3)]);
    expect(layout.length).toBeCloseTo(1223.3626, 4);
    expect(layout.wraps.reduce((sum, w) => sum + w.wrapDeg, 0)).toBeCloseTo(360, 9);
  });

  it('case B: a back-side idler pressing on the top run', () => {
    // Derived: as case A, with signed radius −r on the idler.
    const layout = layoutOf([crank, waterPump, idler(300), alternator]);
    expect(layout.runs.map((r) => r.length)).toEqual([
      expect.closeTo(290, 3),
      expect.closeTo(133.323, 3),
      expect.closeTo(144.135, 3),
      expect.closeTo(287.228, 3),
    ]);
    expect(layout.wraps.map((w) => w.wrapDeg)).toEqual([
      expect.closeTo(133.854, 3),
      expect.closeTo(129.142, 3),
      expect.closeTo(-19.923, 3),
      expect.closeTo(116.928, 3),
    ]);
    expect(layout.length).toBeCloseTo(1227.6727, 4);
    const idlerWrap = layout.wraps[2].wrapDeg;
    expect(idlerWrap).toBeGreaterThan(-180);
    expect(idlerWrap).toBeLessThan(0);
  });

  it('refuses an idler that no longer touches the run', () => {
    // Derived: the run passes at about y = 290; the idler's bottom is at 330 − 35 = 295.
    const result = serpentineLength([crank, waterPump, idler(330), alternator]);
    expect(result).toMatchObject({ ok: false, code: 'idler-not-touching', pulleyId: 'idler' });
  });

  it('refuses clockwise order unless told to accept either', () => {
    const reversed = [alternator, waterPump, crank];
    expect(serpentineLength(reversed).ok).toBe(false);
    const either = serpentineLength(reversed, { orientation: 'either' });
    expect(either).toMatchObject({ ok: true, order: 'reversed' });
    if (either.ok) expect(either.length).toBeCloseTo(1223.3626, 4);
  });

  it('refuses overlapping pulleys, a single pulley and a grooved pulley inside the loop', () => {
    expect(serpentineLength([crank, { ...waterPump, x: 50, y: 50 }])).toMatchObject({ ok: false, code: 'pulleys-overlap' });
    expect(serpentineLength([crank])).toMatchObject({ ok: false, code: 'too-few-pulleys' });
    const inside: BeltPulley = { id: 'inside', x: 0, y: 150, diameter: 40, side: 'grooved' };
    expect(serpentineLength([crank, waterPump, inside, alternator])).toMatchObject({ ok: false, code: 'not-a-loop' });
  });

  it('two pulleys agree with the open-belt formula', () => {
    // Source: Encyclopaedia Britannica, 11th ed. (1911), "Mechanics" §59, eq. 32A (open belt).
    const layout = layoutOf([
      { id: 'a', x: 0, y: 0, diameter: 200, side: 'grooved' },
      { id: 'b', x: 400, y: 0, diameter: 100, side: 'grooved' },
    ]);
    expect(layout.length).toBeCloseTo(1277.4970744746527, 9);
  });

  it('grows as the water pump moves away from the crank (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 300, noNaN: true }), fc.double({ min: 0.5, max: 100, noNaN: true }), (lift, step) => {
        const near = layoutOf([crank, { ...waterPump, y: 250 + lift }, { ...alternator, y: 250 + lift }]);
        const far = layoutOf([crank, { ...waterPump, y: 250 + lift + step }, { ...alternator, y: 250 + lift + step }]);
        return far.length > near.length;
      }),
    );
  });

  it('matches the two-pulley formula for any pair (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 45, max: 300, noNaN: true }),
        fc.double({ min: 45, max: 300, noNaN: true }),
        fc.double({ min: 1, max: 800, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        (da, db, extra, heading) => {
          const C = (da + db) / 2 + extra;
          const result = serpentineLength([
            { id: 'a', x: 0, y: 0, diameter: da, side: 'grooved' },
            { id: 'b', x: C * Math.cos(heading), y: C * Math.sin(heading), diameter: db, side: 'grooved' },
          ]);
          const expected = openBeltLengthExact(Math.max(da, db), Math.min(da, db), C);
          return result.ok && Math.abs(result.length - expected) < 1e-6 * expected;
        },
      ),
    );
  });
});
