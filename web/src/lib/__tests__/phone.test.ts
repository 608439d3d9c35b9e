import { describe, expect, it } from 'vitest';
import { phoneProblem } from '../phone';

describe('phoneProblem', () => {
  it('takes the usual ways of writing a number', () => {
    for (const ok of ['555-0142', '+1 (555) 010-4477', '(03) 9555 0199', '0412 555 019', '555 0142 x12', '']) expect(phoneProblem(ok)).toBeNull();
  });

  it('refuses a minus sign in front and more digits than any number has', () => {
    expect(phoneProblem('-99999999999999999999')).toBe('Start the phone number with a digit, a + or a bracket.');
    // Source: ITU-T Recommendation E.164, clause 6: an international number has at most 15 digits
    expect(phoneProblem('99999999999999999999')).toBe('A phone number has at most 15 digits, country code included.');
    expect(phoneProblem('+123456789012345')).toBeNull();
  });

  it('refuses a number too short to dial', () => {
    expect(phoneProblem('555')).toBe('A phone number has at least 7 digits.');
  });
});
