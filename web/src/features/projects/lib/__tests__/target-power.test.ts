import { describe, expect, it } from 'vitest';
import { hpToKw, kwToHp } from '@/lib/units';
import { TARGET_POWER_BOUNDS } from '../target-power';

describe('the target power box', () => {
  it('keeps horsepower to round figures inside what the project record holds in kW', () => {
    const { kW, hp } = TARGET_POWER_BOUNDS;
    // Source: NIST SP 811 (2008) B.8: 1 hp (550 ft·lbf/s) = 745.6999 W, so 2,000 kW = 2,682 hp and 10 kW = 13.4 hp.
    expect(kwToHp(2000)).toBeCloseTo(2682.0, 0);
    expect(kwToHp(10)).toBeCloseTo(13.41, 1);
    // what the form sends: the horsepower turned into kW to 0.1 kW, inside 10 to 2,000 kW at both ends
    const sent = (value: number) => Math.round(hpToKw(value) * 10) / 10;
    expect(sent(hp.min)).toBeGreaterThanOrEqual(kW.min);
    expect(sent(hp.max)).toBeLessThanOrEqual(kW.max);
    expect(hp.max % 100).toBe(0);
    expect(hp.message).toBe('Between 15 and 2,600 hp (the project record holds 10 to 2,000 kW)');
    expect(kW).toMatchObject({ min: 10, max: 2000 });
  });
});
