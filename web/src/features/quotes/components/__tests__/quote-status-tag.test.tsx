import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { QuoteStatusTag } from '../quote-status-tag';

describe('QuoteStatusTag', () => {
  it('tells the shop the quote waits for the customer, and the customer that it waits for them', () => {
    const { unmount } = render(<QuoteStatusTag status="awaiting-answer" />);
    expect(screen.getByText('Awaiting the customer')).toBeInTheDocument();
    unmount();
    render(<QuoteStatusTag status="awaiting-answer" forCustomer />);
    expect(screen.getByText('Waiting for your answer')).toBeInTheDocument();
  });

  it('uses the same words for both once answered', () => {
    render(<QuoteStatusTag status="approved" forCustomer />);
    expect(screen.getByText('Approved')).toBeInTheDocument();
  });
});
