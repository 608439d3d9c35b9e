import { formatFindingFigure, formatQuantity, formatThreshold, MINUS, renderFindingText, renderRemedyText, textParts } from './unit-format';
import { DEMO_FIT_SPEC } from '../fixtures/demo-fit-spec';
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

  it('shows a threshold set in whole millimetres at a round inch figure within its half millimetre', () => {
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly.
    // Derived: 10 mm = 0.3937 in → 0.40 in (0.15 mm off); 100 mm = 3.937 in → 3.95 in (0.33 mm off; 4.00 in
    // would be 1.6 mm off); 25 mm = 0.984 in → 1.00 in (0.4 mm off); 6 mm = 0.236 in → 0.25 in (0.35 mm off).
    expect(formatThreshold(10, 'length', 'in')).toBe('0.40 in');
    expect(formatThreshold(100, 'length', 'in')).toBe('3.95 in');
    expect(formatThreshold(25, 'length', 'in')).toBe('1.00 in');
    expect(formatThreshold(6, 'length', 'in')).toBe('0.25 in');
    // set in inches: shown exactly; in millimetres: as set
    expect(formatThreshold(12.7, 'length', 'in')).toBe('0.50 in');
    expect(formatThreshold(100, 'length', 'mm')).toBe('100.0 mm');
    // a measured figure keeps its precision
    expect(formatQuantity(100, 'length', 'in')).toBe('3.94 in');
  });

  it('renders the threshold a sentence quotes as a threshold, and nothing else', () => {
    // Derived as above: 100 mm → 3.95 in; 96.0 mm / 25.4 = 3.78 in.
    const finding = { message: 'The lowest point sits 96.0 mm (3.78 in) above the ground; at least 100.0 mm (3.94 in) is required.', required: 100, unit: 'mm' as const };
    expect(renderFindingText(finding, 'in')).toBe('The lowest point sits 3.78 in above the ground; at least 3.95 in is required.');
    expect(renderFindingText(finding, 'mm')).toBe('The lowest point sits 96.0 mm above the ground; at least 100.0 mm is required.');
  });

  it('writes a finding’s figures in one system: lb/h, gal/h, psi, hp in inches; kg/h, L/h, kPa, kW in millimetres', () => {
    // Source: NIST SP 811 (2008), Appendix B (factors as above).
    expect(formatFindingFigure(298.28, 'kW', 'in')).toBe('400 hp');
    expect(formatFindingFigure(298.28, 'kW', 'mm')).toBe('298 kW');
    expect(formatFindingFigure(58, 'psi', 'mm')).toBe('399.9 kPa');
    expect(formatFindingFigure(126.18, 'L/h', 'in')).toBe('33.3 gal/h');
    expect(formatFindingFigure(-2.5, 'deg', 'in')).toBe(`${MINUS}2.50°`);
    expect(formatFindingFigure(3200, 'rpm', 'mm')).toBe('3200 rpm');
    expect(formatFindingFigure(100, 'mm', 'in', { threshold: true })).toBe('3.95 in');
  });
});
