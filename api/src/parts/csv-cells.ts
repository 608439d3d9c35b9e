/**
 * A cell that a spreadsheet would run as a formula (=, +, -, @, tab, carriage return first) is written with a
 * leading apostrophe, so an exported catalog or pick list opens as text (the OWASP advice on CSV injection).
 */
export function escapeFormula(value: unknown): string {
  const text = value === null || value === undefined ? '' : String(value);
  return /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
}
