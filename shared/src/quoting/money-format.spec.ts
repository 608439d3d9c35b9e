import { formatMoney, formatMoneyChange, moneySign } from './money-format';

// Source: Unicode CLDR, locale "en" (used for en-US), currency pattern "¤#,##0.00" and symbol "$" for USD,
// "CA$" for CAD and "€" for EUR, as ECMA-402 Intl.NumberFormat with style "currency" applies it.
describe('formatMoney', () => {
  it('writes cents in the currency sign and grouping of en-US', () => {
    expect(formatMoney(513191, 'USD')).toBe('$5,131.91');
    expect(formatMoney(417100, 'USD')).toBe('$4,171.00');
    expect(formatMoney(5, 'USD')).toBe('$0.05');
    expect(formatMoney(0, 'USD')).toBe('$0.00');
    expect(formatMoney(123456789012, 'USD')).toBe('$1,234,567,890.12');
  });

  it('names other currencies by their own sign', () => {
    expect(formatMoney(513191, 'CAD')).toBe('CA$5,131.91');
    expect(formatMoney(513191, 'EUR')).toBe('€5,131.91');
  });

  it('puts the minus before the sign', () => {
    expect(formatMoney(-5000, 'USD')).toBe('-$50.00');
  });

  it('agrees with the plain decimal of the cents, digit for digit', () => {
    // Cents are exact integers: the shown figure is the integer split at two places, never a rounded float.
    for (const cents of [1, 10, 99, 101, 29_995, 1_999_999, 1_000_000_01]) {
      const plain = `${Math.floor(cents / 100).toLocaleString('en-US')}.${String(cents % 100).padStart(2, '0')}`;
      expect(formatMoney(cents, 'USD')).toBe(`$${plain}`);
    }
  });
});

describe('formatMoneyChange', () => {
  it('signs a change with plus or a true minus', () => {
    expect(formatMoneyChange(8035, 'USD')).toBe('+$80.35');
    expect(formatMoneyChange(-10800, 'USD')).toBe('−$108.00');
    expect(formatMoneyChange(0, 'USD')).toBe('$0.00');
  });
});

describe('moneySign', () => {
  it('is the sign formatMoney writes, for the prefix of an amount box', () => {
    expect(moneySign('USD')).toBe('$');
    expect(moneySign('CAD')).toBe('CA$');
    expect(moneySign('EUR')).toBe('€');
  });

  it('writes a plain amount, never throws, when the currency is missing or not a three-letter code', () => {
    // Source: ISO 4217 (alphabetic currency codes are three letters).
    expect(formatMoney(513191, undefined as unknown as string)).toBe('5,131.91');
    expect(formatMoney(513191, 'US')).toBe('5,131.91');
    expect(formatMoney(513191, 'usd')).toBe('$5,131.91');
    expect(moneySign('')).toBe('');
  });
});
