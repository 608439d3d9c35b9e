import fc from 'fast-check';
import { cardanMaxSpeedRatio, cardanMinSpeedRatio, cardanOutputSpeedRange, cardanSpeedFluctuation, cardanSpeedRatio } from './cardan';

describe('Cardan joint speed ratio', () => {
  // Source: standard theory-of-machines texts, Hooke's joint:
  // ω₂/ω₁ = cos β / (1 − sin²β·cos²θ). Tolerance 1e-9 on 7-digit table values means 5e-8 here.
  it.each([
    [3, 1.0013723, 0.9986295, 0.0027428],
    [30, 1.1547005, 0.8660254, 0.2886751],
  ])('β = %d°', (beta, max, min, peakToPeak) => {
    // The table gives 7 decimals: rounded to them, ours must equal it.
    expect(Number(cardanMaxSpeedRatio(beta).toFixed(7))).toBe(max);
    expect(Number(cardanMinSpeedRatio(beta).toFixed(7))).toBe(min);
    expect(Number(cardanSpeedFluctuation(beta).toFixed(7))).toBe(peakToPeak);
    expect(Math.abs(cardanSpeedRatio(beta, 0) - cardanMaxSpeedRatio(beta))).toBeLessThan(1e-9);
    expect(Math.abs(cardanSpeedRatio(beta, 90) - cardanMinSpeedRatio(beta))).toBeLessThan(1e-9);
    expect(Math.abs(cardanMaxSpeedRatio(beta) - cardanMinSpeedRatio(beta) - cardanSpeedFluctuation(beta))).toBeLessThan(1e-9);
  });

  it('β = 30°, θ = 45°', () => {
    // Source: as above, worked value 0.9897433.
    expect(Math.abs(cardanSpeedRatio(30, 45) - 0.9897433)).toBeLessThan(1e-7);
  });

  it('3000 rpm in at β = 3° swings 2995.889–3004.117 rpm', () => {
    // Source: as above.
    const range = cardanOutputSpeedRange(3000, 3);
    expect(range.minRpm).toBeCloseTo(2995.889, 3);
    expect(range.maxRpm).toBeCloseTo(3004.117, 3);
  });

  it('averages to one over a turn (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 45, noNaN: true }), (beta) => {
        // Derived: the output turns once per input turn, so the mean ratio over θ is 1.
        const steps = 3600;
        let sum = 0;
        for (let i = 0; i < steps; i += 1) sum += cardanSpeedRatio(beta, (360 * i) / steps);
        return Math.abs(sum / steps - 1) < 1e-9;
      }),
      { numRuns: 25 },
    );
  });
});
