import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '@/test/render';
import { QuoteTotals } from '../quote-totals';
import { quoteStub } from './quote-stub';

describe('QuoteTotals', () => {
  it("shows a customer's quote with the deposit due on approval", () => {
    renderWithApp(<QuoteTotals quote={quoteStub()} />);
    expect(screen.getByText('Deposit on approval')).toBeInTheDocument();
    expect(screen.getByTestId('quote-deposit')).toHaveTextContent('$543.21');
  });

  it('shows the budget of one’s own build without a deposit: there is nobody to pay it to', () => {
    renderWithApp(<QuoteTotals quote={quoteStub({}, { forMyself: true })} />);
    expect(screen.getByTestId('quote-total')).toBeInTheDocument();
    expect(screen.queryByText('Deposit on approval')).toBeNull();
  });
});
