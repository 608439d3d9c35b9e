import fc from 'fast-check';
import { SUMP_CROSSMEMBER_CHECK } from '../checks/envelope/sump-crossmember';
import { placePan } from '../checks/envelope/placed-engine';
import { runCheck } from '../fixtures/check-test-helpers';
import { DEMO_FIT_SPEC, DEMO_REAR_SUMP_PAN, DEMO_STOCK_PAN } from '../fixtures/demo-fit-spec';
import type { ChassisObstacle } from '../types/fit-spec';
import { outlineGap } from './outline-gap';

/**
 * Property: raising the engine never reduces the gap to an obstacle below it. "Below" here: the obstacle
 * lies under the pan's x span and either sits entirely under the pan's lowest point or already overlaps
 * the pan (the engine has come down into it). Obstacles beside a tilted pan are excluded on purpose: a
 * tilted, overhanging pan wall really does move toward something beside it as it rises.
 */
describe('property: raising the engine never reduces the gap to an obstacle below it', () => {
  const placement = fc.record({
    setbackMm: fc.double({ min: 550, max: 800, noNaN: true }),
    heightMm: fc.double({ min: 380, max: 620, noNaN: true }),
    tiltDeg: fc.double({ min: 0, max: 4, noNaN: true }),
  });
  const pan = fc.constantFrom(DEMO_STOCK_PAN, DEMO_REAR_SUMP_PAN);

  it('for the raw gap', () => {
    fc.assert(
      fc.property(
        pan,
        placement,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 10, max: 150, noNaN: true }),
        fc.double({ min: -200, max: 120, noNaN: true }),
        fc.double({ min: 0, max: 200, noNaN: true }),
        (p, pl, xFrac, width, topAboveLowest, raise) => {
          const placed = placePan(p, pl);
          const xs = placed.map((q) => q.x);
          const lowest = Math.min(...placed.map((q) => q.z));
          const x0 = Math.min(...xs) + xFrac * (Math.max(...xs) - Math.min(...xs) - width);
          const top = lowest + topAboveLowest;
          const obstacle = [ { x: x0, z: top - 100 }, { x: x0 + width, z: top - 100 }, { x: x0 + width, z: top }, { x: x0, z: top } ];
          const before = outlineGap(placed, true, obstacle).gap;
          fc.pre(top <= lowest || before < 0);
          const after = outlineGap(placed, true, obstacle, raise).gap;
          expect(after).toBeGreaterThanOrEqual(before - 1e-9);
        },
      ),
      { numRuns: 500 },
    );
  });

  it('through the sump-crossmember check, with the demo crossmember', () => {
    fc.assert(
      fc.property(pan, placement, fc.double({ min: 0, max: 150, noNaN: true }), (p, pl, raise) => {
        const spec = { ...DEMO_FIT_SPEC, oilPan: p, placement: pl };
        const crossmember = DEMO_FIT_SPEC.chassis.obstacles.find((o) => o.kind === 'crossmember') as ChassisObstacle;
        const placed = placePan(p, pl);
        const before = runCheck(SUMP_CROSSMEMBER_CHECK, spec).measured as number;
        const lowestOver = Math.min(...placed.filter((q) => q.x >= 90 && q.x <= 290).map((q) => q.z), Infinity);
        fc.pre(before < 0 || Math.max(...crossmember.outline.map((q) => q.z)) <= Math.min(lowestOver, ...placed.map((q) => q.z)));
        const after = runCheck(SUMP_CROSSMEMBER_CHECK, { ...spec, placement: { ...pl, heightMm: pl.heightMm + raise } }).measured as number;
        expect(after).toBeGreaterThanOrEqual(before - 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});
