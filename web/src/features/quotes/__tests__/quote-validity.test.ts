import { describe, expect, it } from 'vitest';
import { firstValidDay, validUntilRule } from '../quote-validity';

describe('the last valid day of a quote', () => {
  it("starts at the shop's today, in the shop's time zone", () => {
    // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 2026-12-04T03:30Z is 20:30 on Dec 3 there.
    expect(firstValidDay('America/Denver', new Date('2026-12-04T03:30:00Z'))).toBe('2026-12-03');
    expect(firstValidDay('UTC', new Date('2026-12-04T03:30:00Z'))).toBe('2026-12-04');
    // Source: IANA tz database: Pacific/Kiritimati is UTC+14 all year; 2026-12-03T10:30Z is 00:30 on Dec 4 there.
    expect(firstValidDay('Pacific/Kiritimati', new Date('2026-12-03T10:30:00Z'))).toBe('2026-12-04');
  });

  it('refuses a past day with the date written as everywhere else', async () => {
    const rule = validUntilRule('UTC', () => new Date('2026-12-03T10:00:00Z'));
    await expect(rule.validator(null, '2020-01-01')).rejects.toThrow('Jan 1, 2020 has already passed; choose Dec 3, 2026 or a later day.');
    await expect(rule.validator(null, '2026-12-03')).resolves.toBeUndefined();
    await expect(rule.validator(null, '2027-01-15')).resolves.toBeUndefined();
    // empty is the required rule's business
    await expect(rule.validator(null, '')).resolves.toBeUndefined();
  });

  it("accepts the shop's today in the evening of a zone behind UTC, when UTC is already on the next day", async () => {
    // Source: IANA tz database: America/Denver is UTC−7 in winter (MST); 2026-12-04T03:30Z is 20:30 on Dec 3 there.
    const rule = validUntilRule('America/Denver', () => new Date('2026-12-04T03:30:00Z'));
    await expect(rule.validator(null, '2026-12-03')).resolves.toBeUndefined();
    await expect(rule.validator(null, '2026-12-02')).rejects.toThrow('Dec 2, 2026 has already passed; choose Dec 3, 2026 or a later day.');
  });
});
