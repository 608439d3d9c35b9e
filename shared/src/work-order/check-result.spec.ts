import { describeRange, measuredCheckResult } from './check-result';

describe('a measured check against its allowed range', () => {
  // Common practice (no published source): a pickup screen 6–10 mm above the sump floor.
  const screen = { min: 6, max: 10 };

  it('passes inside the range, both ends included', () => {
    expect(measuredCheckResult(8, screen)).toBe('pass');
    expect(measuredCheckResult(6, screen)).toBe('pass');
    expect(measuredCheckResult(10, screen)).toBe('pass');
  });

  it('fails outside either end', () => {
    expect(measuredCheckResult(5.9, screen)).toBe('fail');
    expect(measuredCheckResult(14, screen)).toBe('fail');
    expect(measuredCheckResult(Number.NaN, screen)).toBe('fail');
  });

  it('reads an open end as no limit', () => {
    expect(measuredCheckResult(400, { min: 13, max: null })).toBe('pass');
    expect(measuredCheckResult(12, { min: 13, max: null })).toBe('fail');
    expect(describeRange({ min: 13, max: null }, 'mm')).toBe('at least 13 mm');
    expect(describeRange(screen, 'mm')).toBe('6–10 mm');
  });
});
