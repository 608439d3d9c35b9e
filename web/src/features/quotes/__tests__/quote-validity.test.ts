import { describe, expect, it } from 'vitest';
import { firstValidDay, validUntilRule } from '../quote-validity';

describe('the last valid day of a quote', () => {
  it('starts at today, and never before the UTC day the server judges by', () => {
    // 2026-12-03 10:00 UTC: the same calendar day in UTC and (in the test's UTC zone) locally.
    expect(firstValidDay(new Date('2026-12-03T10:00:00Z'))).toBe('2026-12-03');
    // Source: ISO 8601: 23:30 at UTC−08:00 is 07:30 the next day in UTC.
    expect(firstValidDay(new Date('2026-12-03T23:30:00-08:00'))).toBe('2026-12-04');
  });

  it('refuses a past day with the date written as everywhere else', async () => {
    const rule = validUntilRule(() => new Date('2026-12-03T10:00:00Z'));
    await expect(rule.validator(null, '2020-01-01')).rejects.toThrow('Jan 1, 2020 has already passed; choose Dec 3, 2026 or a later day.');
    await expect(rule.validator(null, '2026-12-03')).resolves.toBeUndefined();
    await expect(rule.validator(null, '2027-01-15')).resolves.toBeUndefined();
    // empty is the required rule's business
    await expect(rule.validator(null, '')).resolves.toBeUndefined();
  });
});
