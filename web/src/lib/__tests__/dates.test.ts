import { describe, expect, it } from 'vitest';
import { formatDate } from '../dates';

describe('formatDate', () => {
  it('reads a calendar date alone as that day wherever the reader is', () => {
    // Source: ECMAScript Date Time String Format: a date-only form is read as UTC; a local date keeps its day.
    expect(formatDate('2027-01-02')).toBe('Jan 2, 2027');
    expect(formatDate('2026-12-31')).toBe('Dec 31, 2026');
  });

  it('formats full timestamps and says nothing for a missing or broken one', () => {
    expect(formatDate('2026-11-02T12:00:00.000Z')).toBe('Nov 2, 2026');
    expect(formatDate(null)).toBe('—');
    expect(formatDate('not a date')).toBe('—');
  });
});
