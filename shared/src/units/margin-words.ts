/**
 * The one way a signed margin becomes words, wherever a report, a remedy or a screen says how much room is left.
 * A margin is positive inside the rule's limit and negative past it; only a positive one is "to spare". Past a
 * minimum the figure is short ("short by 0.12 in"); past a maximum it is over ("2.0° over"). A margin that shows
 * as zero at the figure's rounding is "right at the limit", never "0.0 mm to spare" next to a failing status.
 */

/** Which side of the rule the margin is measured from: `min` (at least), `max` (at most). */
export type MarginSide = 'min' | 'max';

/**
 * `marginWords(6.4, mmWithInches)` → `6.4 mm (0.25 in) to spare`; `marginWords(-3, mmWithInches)` →
 * `short by 3.0 mm (0.12 in)`; `marginWords(-2, (d) => `${d.toFixed(1)}°`, 'max')` → `2.0° over`.
 * `format` writes the margin's size (never given a negative number).
 */
export function marginWords(margin: number, format: (size: number) => string, side: MarginSide = 'min'): string {
  if (!Number.isFinite(margin)) throw new RangeError(`Cannot describe a margin of ${margin}.`);
  const size = format(Math.abs(margin));
  if (size === format(0)) return 'right at the limit';
  if (margin > 0) return `${size} to spare`;
  return side === 'max' ? `${size} over` : `short by ${size}`;
}
