import fc from 'fast-check';
import { openBeltLengthApprox, openBeltLengthExact, twoPulleyBelt } from './two-pulley';

const DEG = 180 / Math.PI;

describe('two-pulley open belt', () => {
  // Source: Encyclopaedia Britannica, 11th ed. (1911), "Mechanics" §59, eqs. 32A/32B; Shigley's Mechanical
  // Engineering Design, flat-belt geometry table.
  it.each([
    [200, 100, 400, 1277.4889, 1277.4971, 165.638, 194.362],
    [7, 3, 12, 40.0413, 40.04207, 160.812, 199.188],
  ])('D %d, d %d, C %d', (D, d, C, approx, exact, wrapSmall, wrapLarge) => {
    const belt = twoPulleyBelt(D, d, C);
    expect(belt.lengthApprox).toBeCloseTo(approx, 3);
    expect(Math.abs(belt.lengthExact - exact) / exact).toBeLessThan(2e-6);
    expect(belt.wrapSmallRad * DEG).toBeCloseTo(wrapSmall, 3);
    expect(belt.wrapLargeRad * DEG).toBeCloseTo(wrapLarge, 3);
  });

  it('D 300, d 150, C 600', () => {
    // Source: as above, third table row.
    expect(openBeltLengthExact(300, 150, 600)).toBeCloseTo(1916.2456, 4);
    expect(openBeltLengthApprox(300, 150, 600)).toBeCloseTo(1916.2333, 4);
  });

  it('approximate form stays within 0.01 % of the exact one on the table cases', () => {
    for (const [D, d, C] of [[200, 100, 400], [7, 3, 12], [300, 150, 600]]) {
      const exact = openBeltLengthExact(D, d, C);
      expect(Math.abs(openBeltLengthApprox(D, d, C) - exact) / exact).toBeLessThan(1e-4);
    }
  });

  it('equal pulleys: 2C + πD', () => {
    // Derived: φ = 0.
    expect(openBeltLengthExact(100, 100, 300)).toBeCloseTo(600 + Math.PI * 100, 12);
  });

  it('refuses a centre distance too short for the pulleys', () => {
    expect(() => openBeltLengthExact(300, 100, 90)).toThrow(RangeError);
    expect(() => openBeltLengthExact(100, 50, 0)).toThrow(RangeError);
  });

  it('grows with centre distance (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 20, max: 400, noNaN: true }),
        fc.double({ min: 20, max: 400, noNaN: true }),
        fc.double({ min: 0, max: 500, noNaN: true }),
        fc.double({ min: 0.1, max: 500, noNaN: true }),
        (a, b, extra, step) => {
          const D = Math.max(a, b);
          const d = Math.min(a, b);
          const C = (D + d) / 2 + extra + 1;
          return openBeltLengthExact(D, d, C + step) > openBeltLengthExact(D, d, C);
        },
      ),
    );
  });
});
