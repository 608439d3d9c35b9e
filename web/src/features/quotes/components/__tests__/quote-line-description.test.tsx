import { screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import type { QuoteLine } from '../../types';
import { QuoteLineCards } from '../quote-line-cards';
import { QuoteLines } from '../quote-lines';
import { LINES, quoteStub } from './quote-stub';

// Source: NIST SP 811 (2008), Appendix B: 1 in = 25.4 mm exactly. 8.7 mm ÷ 25.4 = 0.3425 in → 0.34 in;
// 72.3 mm ÷ 25.4 = 2.8465 in → 2.85 in.
const DROP: QuoteLine = {
  ...LINES[2],
  key: 'line-drop',
  description: 'Drop the crossmember 8.7 mm (0.34 in) or fit a drop crossmember',
  laborOperationId: null,
  hours: 4,
  lineTotalCents: 54000,
};

describe('a quote line drawn from the parts plan reads in the person’s units', () => {
  afterEach(() => window.localStorage.removeItem('swapwright.unitSystem'));

  it('in inches in the lines table, once and in inches; the stored description stays', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const quote = quoteStub({ lines: [...LINES, DROP] });
    renderWithApp(<QuoteLines quote={quote} />);
    expect(screen.getByText('Drop the crossmember 0.34 in or fit a drop crossmember')).toBeInTheDocument();
    expect(document.body.textContent).not.toContain('8.7 mm');
    expect(quote.revision.lines.at(-1)?.description).toBe('Drop the crossmember 8.7 mm (0.34 in) or fit a drop crossmember');
  });

  it('in millimetres on the phone cards, once and in millimetres', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'mm');
    renderWithApp(<QuoteLineCards lines={[DROP]} currency="USD" />);
    expect(screen.getByTestId('quote-line-line-drop')).toHaveTextContent('Drop the crossmember 8.7 mm or fit a drop crossmember');
    expect(screen.getByTestId('quote-line-line-drop').textContent).not.toContain('0.34 in');
  });

  it('the plan’s one transmission crossmember rework names both moves, each figure in inches', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const rework: QuoteLine = {
      ...DROP,
      key: 'line-rework',
      description: 'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it 8.7 mm (0.34 in), or fit a drop crossmember',
    };
    renderWithApp(<QuoteLineCards lines={[rework]} currency="USD" />);
    expect(screen.getByTestId('quote-line-line-rework')).toHaveTextContent('Rework the transmission crossmember: relocate it 2.85 in rearward and drop it 0.34 in, or fit a drop crossmember');
    expect(screen.getByTestId('quote-line-line-rework').textContent).not.toMatch(/\d mm\b/);
  });

  it('a part line keeps the figures of the part’s own name, so customer and counter read one name', () => {
    window.localStorage.setItem('swapwright.unitSystem', 'in');
    const kit: QuoteLine = { ...LINES[0], key: 'line-kit', kind: 'part', description: 'Heavy mount kit, 90 mm' };
    const labor: QuoteLine = { ...DROP, key: 'line-labor', description: 'Fit the mount kit and shim it 6.0 mm (0.24 in)' };
    renderWithApp(<QuoteLineCards lines={[kit, labor]} currency="USD" />);
    expect(screen.getByTestId('quote-line-line-kit')).toHaveTextContent('Heavy mount kit, 90 mm');
    expect(screen.getByTestId('quote-line-line-kit').textContent).not.toContain('3.54 in');
    expect(screen.getByTestId('quote-line-line-labor')).toHaveTextContent('Fit the mount kit and shim it 0.24 in');
  });
});
