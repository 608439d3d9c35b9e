import { describe, expect, it } from 'vitest';
import { draftedFromWords } from '../drafted-from-words';

describe('draftedFromWords', () => {
  const quote = (partsPlanVersion: number | null, fitReportId: string | null, forMyself = false) => ({ label: 'Q-0004', forMyself, revision: { partsPlanVersion, fitReportId } });

  it('names what the draft was made from', () => {
    expect(draftedFromWords(quote(2, 'report-1'))).toBe('Quote Q-0004 drafted from parts plan version 2 and the fit report');
    expect(draftedFromWords(quote(1, null, true))).toBe('Budget Q-0004 drafted from parts plan version 1');
  });

  it('never claims a plan that was not there', () => {
    expect(draftedFromWords(quote(null, 'report-1'))).toMatch(/drafted from the fit report, without parts: build a parts plan/);
    expect(draftedFromWords(quote(null, null, true))).toBe('Budget Q-0004 started with no lines from a plan: add its lines, or build a parts plan first and draft from it');
  });
});
