import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { Quote } from '../../types';
import { ProjectQuotesCard } from '../project-quotes-card';
import { QuoteWorkspace } from '../quote-workspace';
import { quoteStub } from './quote-stub';

function renderCard(quote: Quote, canWrite = true) {
  vi.spyOn(apiClient, 'get').mockResolvedValue({ data: [quote] });
  return renderWithApp(<ProjectQuotesCard projectId="project-1" canWrite={canWrite} />);
}

describe('ProjectQuotesCard: sending a quote', () => {
  it("offers to send a customer's quote and sends it", async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: quoteStub({ sent: true }, { status: 'awaiting-answer', sentRevision: 1 }) });
    renderCard(quoteStub());
    await userEvent.click(await screen.findByRole('button', { name: 'Send to customer' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/send', undefined, expect.anything()));
    expect(screen.queryByTestId('own-truck-quote-note')).toBeNull();
  });

  it('offers no sending for a quote of the member’s own truck and says why instead', async () => {
    const post = vi.spyOn(apiClient, 'post');
    renderCard(quoteStub({}, { forMyself: true, customerName: 'Wren Halloway' }));
    expect(await screen.findByTestId('own-truck-quote-note')).toHaveTextContent('Your own truck: no customer to send this quote to. Keep it as the budget of your build.');
    expect(screen.queryByRole('button', { name: 'Send to customer' })).toBeNull();
    // the lines stay the owner's to change
    expect(screen.getByRole('link', { name: 'Edit lines' })).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });

  it('shows neither the button nor the note to someone who only reads quotes', async () => {
    renderCard(quoteStub({}, { forMyself: true }), false);
    expect(await screen.findByText('Q-0007')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Send to customer' })).toBeNull();
    expect(screen.queryByTestId('own-truck-quote-note')).toBeNull();
  });
});

describe('QuoteWorkspace: sending a quote of one’s own truck', () => {
  it('puts the reason in place of the send button', async () => {
    const quote = quoteStub({}, { forMyself: true });
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url.startsWith('/quotes/quote-7') ? quote : {} }));
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite />);
    expect(await screen.findByTestId('own-truck-quote-note')).toHaveTextContent('Your own truck: no customer to send this quote to.');
    expect(screen.queryByRole('button', { name: /^Send revision/ })).toBeNull();
  });
});
