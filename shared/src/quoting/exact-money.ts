/**
 * Exact money arithmetic for quotes: amounts are integer cents, rates are decimals with at most
 * RATE_DECIMALS places, and every product is formed with BigInt so nothing is lost to binary fractions.
 * Rounding is half away from zero, applied only where the caller asks (the quote rule's steps).
 */

/** Rates and percentages carry at most this many decimal places (8.875 % is fine, 8.87501 % is refused). */
export const RATE_DECIMALS = 4;
const RATE_SCALE = 10n ** BigInt(RATE_DECIMALS);

export class MoneyInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'MoneyInputError';
  }
}

/** A whole number of cents, checked. */
export function assertCents(value: number, what: string): bigint {
  if (!Number.isSafeInteger(value)) throw new MoneyInputError(`${what} must be a whole number of cents (got ${value}).`);
  return BigInt(value);
}

/** A decimal rate (percent) as an integer count of 10^-RATE_DECIMALS units, refusing more places than that. */
export function scaledRate(value: number, what: string): bigint {
  if (!Number.isFinite(value)) throw new MoneyInputError(`${what} must be a number (got ${value}).`);
  // Decimal text of the number (numbers like 8.875 print exactly as written).
  const text = Math.abs(value).toFixed(RATE_DECIMALS + 2);
  const [whole, fraction = ''] = text.split('.');
  if (/[1-9]/.test(fraction.slice(RATE_DECIMALS))) {
    throw new MoneyInputError(`${what} may have at most ${RATE_DECIMALS} decimal places (got ${value}).`);
  }
  const scaled = BigInt(whole) * RATE_SCALE + BigInt(fraction.slice(0, RATE_DECIMALS).padEnd(RATE_DECIMALS, '0'));
  return value < 0 ? -scaled : scaled;
}

/** numerator / denominator rounded half away from zero (denominator > 0). */
export function divideRounded(numerator: bigint, denominator: bigint): bigint {
  if (denominator <= 0n) throw new MoneyInputError('Division by a non-positive amount.');
  const negative = numerator < 0n;
  const magnitude = negative ? -numerator : numerator;
  const quotient = (magnitude * 2n + denominator) / (denominator * 2n);
  return negative ? -quotient : quotient;
}

/** round(cents x percent / 100), half away from zero. */
export function percentOf(cents: bigint, percent: bigint): bigint {
  return divideRounded(cents * percent, 100n * RATE_SCALE);
}

/** round(cents x (1 + percent / 100)), half away from zero: a cost marked up. */
export function markedUp(cents: bigint, percent: bigint): bigint {
  return divideRounded(cents * (100n * RATE_SCALE + percent), 100n * RATE_SCALE);
}

export function toNumber(cents: bigint): number {
  const value = Number(cents);
  if (!Number.isSafeInteger(value)) throw new MoneyInputError('An amount is too large to quote.');
  return value;
}

/** Cents as a plain decimal string, e.g. 123456 -> "1,234.56" (no currency sign). */
export function formatCents(cents: number): string {
  const negative = cents < 0;
  const magnitude = Math.abs(cents);
  const whole = Math.floor(magnitude / 100).toLocaleString('en-US');
  const fraction = String(magnitude % 100).padStart(2, '0');
  return `${negative ? '-' : ''}${whole}.${fraction}`;
}
