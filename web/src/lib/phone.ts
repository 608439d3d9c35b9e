/**
 * What is wrong with a typed phone number, or null when it reads as one (or is empty).
 * A number has 7 to 15 digits: ITU-T E.164 allows at most 15 digits with the country code; 7 is the
 * shortest local number in common use (Common practice (no published source)). A leading + is the
 * international prefix; a leading minus sign or another sign is not part of a phone number.
 */
export function phoneProblem(text: string): string | null {
  const value = text.trim();
  if (value === '') return null;
  if (!/^\+?[0-9(]/.test(value)) return 'Start the phone number with a digit, a + or a bracket.';
  const digits = value.replace(/\D/g, '').length;
  // Source: ITU-T Recommendation E.164 (11/2010), clause 6: at most 15 digits
  if (digits > 15) return 'A phone number has at most 15 digits, country code included.';
  if (digits < 7) return 'A phone number has at least 7 digits.';
  return null;
}
