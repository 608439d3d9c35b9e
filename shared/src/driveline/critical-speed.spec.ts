import { criticalSpeedFirstPrinciplesRpm, criticalSpeedHandbookRpm, driveshaftCriticalSpeedRpm } from './critical-speed';

const IN = 25.4;

describe('driveshaft critical speed', () => {
  // Source: Machinery's Handbook, 31st ed., "Critical Speeds": N = 4,760,000·d/L² (in), √(D² + d²) for a tube.
  it.each([
    [3.0, 0.083, 50, 7857.7, 7736.5],
    [3.5, 0.083, 45, 11362.4, 11187.2],
  ])('%d × %d × %d in', (od, wall, length, handbook, firstPrinciples) => {
    const h = criticalSpeedHandbookRpm(od * IN, wall * IN, length * IN);
    const f = criticalSpeedFirstPrinciplesRpm(od * IN, wall * IN, length * IN);
    expect(h).toBeCloseTo(handbook, 1);
    // Derived: first principles with E = 29 Msi, 0.283 lb/in³ (from memory); table rounded to 0.1 rpm.
    expect(Math.abs(f - firstPrinciples)).toBeLessThan(0.1);
    expect(Math.abs(h - f) / h).toBeLessThan(0.02);
    // The check computes the handbook form it cites for steel.
    expect(driveshaftCriticalSpeedRpm(od * IN, wall * IN, length * IN)).toBe(h);
  });

  it('falls with the square of length', () => {
    // Derived: N ∝ 1/L².
    expect(criticalSpeedHandbookRpm(76.2, 2.1, 1000) / criticalSpeedHandbookRpm(76.2, 2.1, 2000)).toBeCloseTo(4, 12);
  });

  it('6000 rpm through a 0.70 overdrive fails 75 % of critical on both tubes', () => {
    // Common practice (no published source): shaft speed at most 0.75 × critical.
    const shaftRpm = 6000 / 0.7;
    expect(shaftRpm).toBeCloseTo(8571.4, 1);
    expect(shaftRpm).toBeGreaterThan(0.75 * criticalSpeedHandbookRpm(3 * IN, 0.083 * IN, 50 * IN));
    expect(shaftRpm).toBeGreaterThan(0.75 * criticalSpeedHandbookRpm(3.5 * IN, 0.083 * IN, 45 * IN));
  });

  it('uses only first principles for aluminium', () => {
    const al = driveshaftCriticalSpeedRpm(4 * IN, 0.125 * IN, 50 * IN, 'aluminum');
    expect(al).toBe(criticalSpeedFirstPrinciplesRpm(4 * IN, 0.125 * IN, 50 * IN, 'aluminum'));
  });

  it('refuses impossible tubes', () => {
    expect(() => criticalSpeedHandbookRpm(76, 40, 1000)).toThrow(RangeError);
    expect(() => criticalSpeedFirstPrinciplesRpm(76, 2, 0)).toThrow(RangeError);
  });
});
