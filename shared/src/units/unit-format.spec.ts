import { formatFindingFigure, formatQuantity, MINUS, renderFindingText, renderRemedyText, renderText, textParts } from './unit-format';
import { DEMO_FIT_SPEC } from '../fixtures/demo-fit-spec';
import { mmWithInches } from './figure-format';
import { mmToShownInches } from './length';
import { runFitCheck } from '../fit-report/fit-report';

describe('one formatting path in the reader’s units', () => {
  it('converts each quantity by its exact factor', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm; 1 psi = 6.894757 kPa; 1 lb = 0.45359237 kg;
    // 1 US gal = 3.785412 L; 1 hp (550 ft·lbf/s) = 0.7456999 kW.
    expect(formatQuantity(25.4, 'length', 'in')).toBe('1.00 in');
    expect(formatQuantity(11.6, 'length', 'mm')).toBe('11.6 mm');
    expect(formatQuantity(58, 'pressure', 'mm')).toBe('399.9 kPa');
    expect(formatQuantity(31.25, 'mass-flow', 'mm', { decimals: 2 })).toBe('14.17 kg/h');
    expect(formatQuantity(126.18, 'volume-flow', 'in')).toBe('33.3 gal/h');
    expect(formatQuantity(298.28, 'power', 'in', { decimals: 0 })).toBe('400 hp');
  });

  it('writes one minus sign and no negative zero', () => {
    // Common practice (no published source): a typographic minus (U+2212) for negative figures.
    expect(formatQuantity(-2.54, 'length', 'in')).toBe(`${MINUS}0.10 in`);
    expect(formatQuantity(-0.01, 'length', 'mm')).toBe('0.0 mm');
    expect(formatQuantity(-1.5, 'angle', 'mm')).toBe(`${MINUS}1.5°`);
    expect(formatQuantity(3, 'length', 'mm', { signed: true })).toBe('+3.0 mm');
  });

  it('reads the engine’s figures back and leads with the reader’s unit', () => {
    // Derived: 11.6 mm / 25.4 = 0.4567 in.
    const sentence = 'The pan clears it by 11.6 mm (0.46 in); the pump gives 126.2 L/h at 58.0 psi for 298.3 kW, 6PK1225, -2.50°.';
    expect(textParts(sentence).filter((p) => typeof p !== 'string')).toHaveLength(5);
    expect(renderFindingText({ message: sentence }, 'in')).toBe(
      `The pan clears it by 0.46 in; the pump gives 33.3 gal/h at 58.0 psi for 400.0 hp, 6PK1225, ${MINUS}2.50°.`,
    );
    expect(renderFindingText({ message: sentence }, 'mm')).toBe(
      `The pan clears it by 11.6 mm; the pump gives 126.2 L/h at 399.9 kPa for 298.3 kW, 6PK1225, ${MINUS}2.50°.`,
    );
  });

  it('in a part name reads only the engine’s paired lengths, leaving the maker’s own figures as printed', () => {
    // Derived: 72.3 mm / 25.4 = 2.846 in. "90 mm" and "190 L/h" are part of invented catalog names.
    const name = 'Heavy mount kit, 90 mm, with 190 L/h lift pump: drop crossmember 72.3 mm (2.85 in) setback';
    expect(renderText(textParts(name, { pairedLengthsOnly: true }), 'in')).toBe(
      'Heavy mount kit, 90 mm, with 190 L/h lift pump: drop crossmember 2.85 in setback',
    );
    expect(renderText(textParts(name), 'in')).toContain('3.54 in');
  });

  it('renders every finding and remedy of the demo report without a stray millimetre in inch mode', () => {
    // Common practice (no published source): a shop working in inches reads inches only.
    const report = runFitCheck(DEMO_FIT_SPEC);
    for (const finding of report.findings) {
      const text = renderFindingText(finding, 'in');
      expect(text).not.toMatch(/\d mm\b/);
      expect(text).not.toMatch(/\d (kPa|kg\/h|L\/h|kW)\b/);
      for (const remedy of finding.remedies) expect(renderRemedyText(remedy, 'in')).not.toMatch(/\d mm\b/);
    }
  });

  it('shows a threshold at the same precision as the figure held against it', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly.
    // Derived: 3 mm = 0.1181 in → 0.12 in; 50 mm = 1.9685 in → 1.97 in; 10 mm = 0.3937 in → 0.39 in;
    // 100 mm = 3.937 in → 3.94 in; 25 mm = 0.9843 in → 0.98 in; 6 mm = 0.2362 in → 0.24 in; 12.7 mm = 0.5 in.
    expect(formatQuantity(3, 'length', 'in')).toBe('0.12 in');
    expect(formatQuantity(50, 'length', 'in')).toBe('1.97 in');
    expect(formatQuantity(10, 'length', 'in')).toBe('0.39 in');
    expect(formatQuantity(100, 'length', 'in')).toBe('3.94 in');
    expect(formatQuantity(25, 'length', 'in')).toBe('0.98 in');
    expect(formatQuantity(6, 'length', 'in')).toBe('0.24 in');
    expect(formatQuantity(12.7, 'length', 'in')).toBe('0.50 in');
    expect(formatQuantity(100, 'length', 'mm')).toBe('100.0 mm');
  });

  it('renders the threshold a sentence quotes as the table shows it', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm. Derived: 100 mm → 3.94 in; 96.0 mm / 25.4 = 3.78 in.
    const finding = { message: 'The lowest point sits 96.0 mm (3.78 in) above the ground; at least 100.0 mm (3.94 in) is required.', required: 100, unit: 'mm' as const };
    expect(renderFindingText(finding, 'in')).toBe('The lowest point sits 3.78 in above the ground; at least 3.94 in is required.');
    expect(renderFindingText(finding, 'mm')).toBe('The lowest point sits 96.0 mm above the ground; at least 100.0 mm is required.');
    expect(formatFindingFigure(100, 'mm', 'in')).toBe('3.94 in');
  });

  it('writes a finding’s figures in one system: lb/h, gal/h, psi, hp in inches; kg/h, L/h, kPa, kW in millimetres', () => {
    // Source: NIST SP 811 (2008), Appendix B (factors as above).
    expect(formatFindingFigure(298.28, 'kW', 'in')).toBe('400 hp');
    expect(formatFindingFigure(298.28, 'kW', 'mm')).toBe('298 kW');
    expect(formatFindingFigure(58, 'psi', 'mm')).toBe('399.9 kPa');
    expect(formatFindingFigure(126.18, 'L/h', 'in')).toBe('33.3 gal/h');
    expect(formatFindingFigure(-2.5, 'deg', 'in')).toBe(`${MINUS}2.50°`);
    expect(formatFindingFigure(3200, 'rpm', 'mm')).toBe('3200 rpm');
  });
});

describe('one inch text for one length', () => {
  // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly. Inches are converted from the millimetres
  // as written to 0.1 mm, then shown to 0.01 in.

  it('prints the same magnitude for a length in a signed and an absolute context', () => {
    // Derived: 97.4 mm / 25.4 = 3.8346 in → 3.83 in; a raw 97.43 mm writes 97.4 mm, so it reads 3.83 in too
    // (97.43 / 25.4 = 3.8358 would have read 3.84 in converted unrounded).
    expect(formatQuantity(-97.4, 'length', 'in')).toBe(`${MINUS}3.83 in`);
    expect(formatQuantity(97.4, 'length', 'in')).toBe('3.83 in');
    expect(formatQuantity(-97.43, 'length', 'in')).toBe(`${MINUS}3.83 in`);
    expect(formatQuantity(97.43, 'length', 'in')).toBe('3.83 in');
    expect(formatFindingFigure(-97.43, 'mm', 'in', { signed: true })).toBe(`${MINUS}3.83 in`);
    expect(renderFindingText({ message: 'The oil pan runs 97.4 mm (3.84 in) into the front crossmember.' }, 'in')).toBe(
      'The oil pan runs 3.83 in into the front crossmember.',
    );
    // halves round away from zero on both sides
    expect(formatQuantity(-0.25, 'length', 'mm')).toBe(`${MINUS}0.3 mm`);
    expect(formatQuantity(0.25, 'length', 'mm')).toBe('0.3 mm');
  });

  it('shows a table figure and the sentence written from it alike', () => {
    // Derived: 159.87 mm writes 159.9 mm; 159.9 / 25.4 = 6.2953 in → 6.30 in (unrounded 159.87 / 25.4 = 6.2941).
    expect(formatFindingFigure(159.87, 'mm', 'in')).toBe('6.30 in');
    expect(renderFindingText({ message: `It is ${mmWithInches(159.87)} in all.` }, 'in')).toBe('It is 6.30 in in all.');
    expect(mmWithInches(159.87)).toBe('159.9 mm (6.30 in)');
  });

  it('keeps found − needed = margin as shown, within the last digit', () => {
    // Derived: 68.5 mm → 2.70 in, 3.0 mm → 0.12 in, −65.5 mm → −2.58 in (2.70 − 0.12 = 2.58);
    // 46.7 mm → 1.84 in, 50.0 mm → 1.97 in, +3.3 mm → +0.13 in (1.97 − 1.84 = 0.13);
    // −97.4 mm → −3.83 in, 12.7 mm → 0.50 in, −110.1 mm → −4.33 in (−3.83 − 0.50 = −4.33).
    const rows: Array<[number, number, number, 'min' | 'max']> = [
      [68.54, 3, -65.54, 'max'],
      [46.7, 50, 3.3, 'max'],
      [-97.43, 12.7, -110.13, 'min'],
    ];
    const shown = (mm: number) => Number(formatFindingFigure(mm, 'mm', 'in').replace(MINUS, '-').replace(/ in$/, ''));
    for (const [found, needed, margin, limit] of rows) {
      const difference = limit === 'max' ? shown(needed) - shown(found) : shown(found) - shown(needed);
      expect(Math.abs(difference - shown(margin))).toBeLessThanOrEqual(0.0100001);
    }
    expect(formatFindingFigure(3, 'mm', 'in')).toBe('0.12 in');
    expect(formatFindingFigure(50, 'mm', 'in')).toBe('1.97 in');
    expect(formatFindingFigure(-65.54, 'mm', 'in', { signed: true })).toBe(`${MINUS}2.58 in`);
    expect(formatFindingFigure(3.3, 'mm', 'in', { signed: true })).toBe('+0.13 in');
  });

  it('writes the inches beside the millimetres from the millimetres as written', () => {
    // Derived: 3.0 mm → 0.12 in; 50.0 mm → 1.97 in; −97.43 mm writes −97.4 mm → −3.83 in.
    expect(mmWithInches(3)).toBe('3.0 mm (0.12 in)');
    expect(mmWithInches(50)).toBe('50.0 mm (1.97 in)');
    expect(mmWithInches(-97.43)).toBe('-97.4 mm (-3.83 in)');
    expect(mmWithInches(97.43)).toBe('97.4 mm (3.83 in)');
    expect(mmToShownInches(-97.43)).toBeCloseTo(-97.4 / 25.4, 12);
  });
});
