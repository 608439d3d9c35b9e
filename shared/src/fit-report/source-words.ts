/**
 * A check's threshold source as a customer reads it. The engine marks a limit no published source backs with
 * "Common practice (no published source)" (the marker the code and its tests search for); on screen and on
 * paper that honesty stays, in the shop's own words.
 */
const CUSTOMER_WORDS: Array<[RegExp, string]> = [
  [/Common practice \(no published source\)/g, 'Shop rule of thumb, not a published standard'],
  [/\(common practice, no published source\)/g, '(a shop rule of thumb, not a published standard)'],
  [/\(common practice\)/g, '(a shop rule of thumb)'],
  [/Common practice/g, 'Shop rule of thumb'],
  [/common practice/g, 'shop rule of thumb'],
];

/** "Common practice (no published source): an inch of spline…" → "Shop rule of thumb, not a published standard: an inch of spline…". */
export function customerSourceWords(source: string): string {
  return CUSTOMER_WORDS.reduce((text, [pattern, words]) => text.replace(pattern, words), source);
}
