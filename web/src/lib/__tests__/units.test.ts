import { inchesToMm as sharedInchesToMm, mmToInches as sharedMmToInches } from '@swapwright/shared';
import { describe, expect, it } from 'vitest';
import { formatLength, formatPower, inchesToMm, mmToInches, parseLength, readAngle, readLength } from '../units';

describe('length units', () => {
  it('agree with the shared package', () => {
    for (const v of [0, 1, 12.5, 317.5, 1041.4, -3.2]) {
      expect(inchesToMm(v)).toBe(sharedInchesToMm(v));
      expect(mmToInches(v)).toBe(sharedMmToInches(v));
    }
  });

  it('12.5 in is 317.5 mm (1 in = 25.4 mm exactly)', () => {
    expect(inchesToMm(12.5)).toBe(317.5);
    expect(parseLength('12.5 in', 'mm')).toBe(317.5);
    expect(formatLength(317.5, 'in')).toBe('12.50 in');
  });

  it('reads fractions of an inch as a shop writes them', () => {
    // Source: NIST SP 811, 1 in = 25.4 mm exactly: 12 1/2 in = 12.5 × 25.4 = 317.5 mm.
    expect(parseLength('12 1/2"', 'mm')).toBe(317.5);
    expect(parseLength('12-1/2 in', 'mm')).toBe(317.5);
  });

  it('formats power in hp with inches and kW with millimetres', () => {
    // One system per figure: hp in inch mode, kW in millimetre mode (1 hp = 0.7457 kW, NIST SP 811).
    expect(formatPower(298, 'in')).toBe('400 hp');
    expect(formatPower(298, 'mm')).toBe('298 kW');
  });
});

describe('readLength and readAngle', () => {
  it('read fractions, decimals and millimetres alike', () => {
    // Source: NIST SP 811 (2008), Appendix B.8: 1 in = 25.4 mm exactly; 21 1/2 in = 546.1 mm.
    expect(readLength('21 1/2', 'in')).toEqual({ ok: true, value: expect.closeTo(546.1, 9) });
    expect(readLength('21.5', 'in')).toEqual({ ok: true, value: expect.closeTo(546.1, 9) });
    expect(readLength('546.1 mm', 'in')).toEqual({ ok: true, value: 546.1 });
    expect(readLength('546,1', 'mm')).toEqual({ ok: true, value: 546.1 });
  });

  it('say what they cannot read', () => {
    expect(readLength('21 furlongs', 'in')).toEqual({ ok: false, message: expect.stringContaining('"furlongs" is not a length unit') });
    expect(readLength('', 'in')).toEqual({ ok: false, message: expect.stringContaining('Enter a length') });
    expect(readAngle('2.5°')).toEqual({ ok: true, value: 2.5 });
    expect(readAngle('-1 deg')).toEqual({ ok: true, value: -1 });
    expect(readAngle('up')).toEqual({ ok: false, message: expect.stringContaining('"up" is not an angle') });
  });
});
