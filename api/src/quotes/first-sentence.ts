/** The first sentence of a remedy or finding text (the rest is in the fit report). */
export function firstSentence(text: string): string {
  const end = text.search(/\.\s/);
  return end > 0 && end < 240 ? text.slice(0, end + 1) : text.length > 240 ? `${text.slice(0, 237)}…` : text;
}
