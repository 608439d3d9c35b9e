import fc from 'fast-check';
import { unit } from 'mathjs';
import { formatLength, inchesToMm, LengthParseError, lengthToMm, mmToInches, MM_PER_INCH, parseLength, parseLengthResult } from './length';

describe('length conversions', () => {
  it('uses the exact inch', () => {
    // Source: NIST SP 811 (2008), Appendix B.8: 1 in = 25.4 mm exactly (international inch, 1959).
    expect(MM_PER_INCH).toBe(25.4);
    expect(inchesToMm(12.5)).toBe(317.5);
    expect(mmToInches(317.5)).toBe(12.5);
  });

  it('agrees with mathjs for inches, feet and centimetres', () => {
    // Source: mathjs 15 unit definitions (independent reference library).
    expect(lengthToMm(7, 'in')).toBeCloseTo(unit(7, 'inch').toNumber('mm'), 12);
    expect(lengthToMm(3, 'ft')).toBeCloseTo(unit(3, 'ft').toNumber('mm'), 12);
    expect(lengthToMm(31.8, 'cm')).toBeCloseTo(unit(31.8, 'cm').toNumber('mm'), 12);
  });
});

describe('parseLength', () => {
  it.each([
    ['12.5 in', 317.5],
    ['12 1/2"', 317.5],
    ['12-1/2 in', 317.5],
    ['12 1/2 inches', 317.5],
    ['12.5in', 317.5],
    ['1/2"', 12.7],
    ['318 mm', 318],
    ['31.8 cm', 318],
    ['2 ft', 609.6],
    [' -3/4 in ', -19.05],
    ['1,200 mm', 1200],
  ])('reads %s as %d mm', (text, mm) => {
    // Derived: 1 in = 25.4 mm, 1 cm = 10 mm, 1 ft = 304.8 mm.
    expect(parseLength(text)).toBeCloseTo(mm, 9);
  });

  it('reads a bare number in the default unit', () => {
    expect(parseLength('12.5', 'in')).toBeCloseTo(317.5, 12);
    expect(parseLength('318', 'mm')).toBe(318);
    expect(parseLength('318')).toBe(318);
  });

  it.each([
    ['', 'empty'],
    ['   ', 'empty'],
    ['abc', 'not-a-number'],
    ['12..5 in', 'unknown-unit'],
    ['12 furlongs', 'unknown-unit'],
    ['12 kg', 'unknown-unit'],
    ['3/0 in', 'zero-denominator'],
    ['1 1/0 in', 'zero-denominator'],
  ])('refuses %p with %s', (text, code) => {
    const result = parseLengthResult(text);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error.code).toBe(code);
    expect(() => parseLength(text)).toThrow(LengthParseError);
  });

  it('gives a message a person can act on', () => {
    expect(() => parseLength('12 kg')).toThrow('"kg" is not a length unit: use in, ", mm, cm or ft.');
  });
});

describe('formatLength', () => {
  it('formats inches as sixteenths, reduced', () => {
    expect(formatLength(317.5, { unit: 'in' })).toBe('12 1/2 in');
    expect(formatLength(inchesToMm(3 + 3 / 16), { unit: 'in' })).toBe('3 3/16 in');
    expect(formatLength(inchesToMm(0.25), { unit: 'in' })).toBe('1/4 in');
    expect(formatLength(inchesToMm(-1.75), { unit: 'in' })).toBe('-1 3/4 in');
    expect(formatLength(1270, { unit: 'in' })).toBe('50 in');
    expect(formatLength(0.1, { unit: 'in' })).toBe('0 in');
  });

  it('formats decimals and millimetres', () => {
    expect(formatLength(317.5, { unit: 'in', style: 'decimal' })).toBe('12.50 in');
    expect(formatLength(317.5, { unit: 'in', style: 'decimal', decimals: 3 })).toBe('12.500 in');
    expect(formatLength(317.54, { unit: 'mm' })).toBe('317.5 mm');
    expect(formatLength(-0.01, { unit: 'mm' })).toBe('0.0 mm');
  });

  it('round-trips through parseLength to within half a sixteenth', () => {
    fc.assert(
      fc.property(fc.double({ min: -5000, max: 5000, noNaN: true }), (mm) => {
        const back = parseLength(formatLength(mm, { unit: 'in' }));
        return Math.abs(back - mm) <= MM_PER_INCH / 32 + 1e-9;
      }),
    );
  });
});
