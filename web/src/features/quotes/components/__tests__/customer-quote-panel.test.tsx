import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { quoteKeys } from '../../api/quote-keys';
import { CustomerQuotePanel } from '../quote-answer-panel';
import { quoteStub } from './quote-stub';

const SENT = { status: 'awaiting-answer', sentRevision: 1 } as const;

function renderPanel(quote = quoteStub({ sent: true }, SENT)) {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(quoteKeys.detail('quote-7'), quote);
  vi.spyOn(apiClient, 'get').mockResolvedValue({ data: quote });
  return renderWithApp(<CustomerQuotePanel quoteId="quote-7" />, { queryClient });
}

describe('CustomerQuotePanel (the signed-in customer answers a sent quote)', () => {
  it('says what accepting means for their money before they accept', async () => {
    renderPanel();
    // Hand-worked from the stub's totals: total 1,810.71, deposit 30 % = 543.21, the rest 1,810.71 − 543.21 = 1,267.50.
    expect(await screen.findByTestId('answer-money')).toHaveTextContent(
      'Accepting asks you for a deposit of $543.21 of the $1,810.71 total, paid by card on the next step. Nothing is charged when you accept',
    );
    expect(screen.getByTestId('answer-money')).toHaveTextContent('The remaining $1,267.50 is not charged here.');
    expect(screen.getByText(/never work under a vehicle held only by a jack/i)).toBeInTheDocument();
    // The customer reads whose quote it is.
    expect(screen.getByText('Test Garage')).toBeInTheDocument();
  });

  it('accepts through the signed-in route, then pays the deposit with the local test card', async () => {
    const approved = quoteStub({ sent: true }, { ...SENT, status: 'approved', depositState: 'due' });
    const post = vi.spyOn(apiClient, 'post').mockImplementation(async (url: string) =>
      url.endsWith('/answer') ? { data: approved } : { data: { quoteId: 'quote-7', state: 'processing' } },
    );
    renderPanel();
    await userEvent.click(await screen.findByRole('button', { name: 'Accept this quote' }));
    // nothing is sent before the customer confirms
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(within(await screen.findByRole('tooltip')).getByRole('button', { name: 'Accept' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/answer', { answer: 'accept' }, expect.anything()));

    expect(await screen.findByText(/Your card is charged this amount once/)).toHaveTextContent('Deposit due: $543.21 of the $1,810.71 total.');
    await userEvent.type(screen.getByLabelText('Card number (local test payment service)'), '4242 4242 4242 4242');
    await userEvent.click(screen.getByRole('button', { name: 'Pay the deposit' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/deposit', { paymentMethod: 'pm_card_visa' }, expect.anything()));
    expect(await screen.findByText(/waiting for the payment service to confirm it/)).toBeInTheDocument();
  });

  it('asks for a card number when the field is empty, and sends nothing', async () => {
    const post = vi.spyOn(apiClient, 'post');
    renderPanel(quoteStub({ sent: true }, { ...SENT, status: 'approved', depositState: 'due' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Pay the deposit' }));
    expect(await screen.findByText('Enter a card number.')).toBeInTheDocument();
    expect(screen.queryByText(/test cards/)).not.toBeInTheDocument();
    // blanks only count as empty too
    await userEvent.type(screen.getByLabelText('Card number (local test payment service)'), '   ');
    await userEvent.click(screen.getByRole('button', { name: 'Pay the deposit' }));
    expect(await screen.findByText('Enter a card number.')).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });

  it('once paid, states the amount received and that the rest is not charged here', async () => {
    renderPanel(quoteStub({ sent: true }, { ...SENT, status: 'approved', depositState: 'paid', depositPaidAt: '2026-12-03T11:00:00.000Z' }));
    expect(await screen.findByText(/Deposit paid\. Thank you/)).toBeInTheDocument();
    expect(screen.getByText(/^\$543\.21 received on .*The remaining \$1,267\.50 is not charged here\.$/)).toBeInTheDocument();
  });
});
