import { renderText, textParts } from '../units/unit-format';
import { quoteLineTextOptions } from './line-text';

describe('quoteLineTextOptions', () => {
  const say = (line: Parameters<typeof quoteLineTextOptions>[0] & { description: string }) => renderText(textParts(line.description, quoteLineTextOptions(line)), 'in');

  it("converts every figure of the fit check's own sentence, as the fit report does", () => {
    // Source: NIST Handbook 44 (2024), Appendix C: 1 US gallon = 3.785 411 784 L exactly; 138.1 L/h / 3.785 411 784 = 36.48 gal/h.
    expect(say({ kind: 'part', source: 'fit-remedy', catalogItemId: null, description: 'A pump that delivers at least 138.1 L/h at 43.5 psi.' })).toBe(
      'A pump that delivers at least 36.5 gal/h at 43.5 psi.',
    );
  });

  it("keeps a named part's lone figures as its maker prints them", () => {
    expect(say({ kind: 'part', source: 'fit-remedy', catalogItemId: 'pump-1', description: 'In-tank pump, 255 L/h' })).toBe('In-tank pump, 255 L/h');
    expect(say({ kind: 'part', source: 'manual', description: 'In-tank pump, 255 L/h' })).toBe('In-tank pump, 255 L/h');
    expect(say({ kind: 'part', description: 'Heavy mount kit, 90 mm' })).toBe('Heavy mount kit, 90 mm');
  });
});
