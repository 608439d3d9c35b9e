import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError } from 'axios';
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
    expect(screen.queryByRole('button', { name: 'Start my build' })).toBeNull();
  });
});

const STARTED = { quote: quoteStub({ sent: true }, { forMyself: true, status: 'approved', sentRevision: 1 }), workOrderId: 'work-order-3' };

describe('ProjectQuotesCard: starting the build of one’s own truck', () => {
  it('says what starting does, starts it on confirmation and opens the work order', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: STARTED });
    renderCard(quoteStub({}, { forMyself: true }));
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    // Nothing happens before the confirmation, which says what it does.
    expect(post).not.toHaveBeenCalled();
    expect(await screen.findByText('Start your build from Q-0007?')).toBeInTheDocument();
    expect(screen.getByText(/Revision 1 is frozen as the budget of your build, and the work order opens/)).toBeInTheDocument();
    expect(screen.getByText(/No e-mail, no deposit\./)).toBeInTheDocument();
    const confirm = screen.getAllByRole('button', { name: 'Start my build' }).at(-1)!;
    await userEvent.click(confirm);
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/start-own-build', undefined, expect.anything()));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/work-orders/work-order-3'));
  });

  it('offers no start for a customer’s quote', async () => {
    renderCard(quoteStub());
    expect(await screen.findByRole('button', { name: 'Send to customer' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start my build' })).toBeNull();
  });

  it('offers no second start once the build has started', async () => {
    renderCard(STARTED.quote);
    expect(await screen.findByText('Q-0007')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start my build' })).toBeNull();
    expect(screen.queryByTestId('own-truck-quote-note')).toBeNull();
  });

  it('shows the refusal beside the button and stays on the project', async () => {
    const message = 'Your build was already started from this budget (revision 1); open its work order under Work orders. For further work, start a new quote.';
    const refusal = new AxiosError('409', 'ERR_BAD_REQUEST', undefined, undefined, {
      status: 409,
      statusText: '',
      headers: {},
      config: {} as never,
      data: { statusCode: 409, error: '', code: 'quote_own_build_started', message, details: [], correlationId: 'c-1' },
    });
    vi.spyOn(apiClient, 'post').mockRejectedValue(refusal);
    renderCard(quoteStub({}, { forMyself: true }));
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    await userEvent.click((await screen.findAllByRole('button', { name: 'Start my build' })).at(-1)!);
    expect(await screen.findByText(/Your build was already started from this budget/)).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent(/^\/$/);
  });
});

describe('QuoteWorkspace: sending a quote of one’s own truck', () => {
  it('puts the reason in place of the send button', async () => {
    const quote = quoteStub({}, { forMyself: true });
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url.startsWith('/quotes/quote-7') ? quote : {} }));
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    expect(await screen.findByTestId('own-truck-quote-note')).toHaveTextContent('Your own truck: no customer to send this quote to.');
    expect(screen.queryByRole('button', { name: /^Send revision/ })).toBeNull();
  });

  it('offers to start the build in its place and opens the work order', async () => {
    const quote = quoteStub({}, { forMyself: true });
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url.startsWith('/quotes/quote-7') ? quote : {} }));
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: STARTED });
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    await userEvent.click((await screen.findAllByRole('button', { name: 'Start my build' })).at(-1)!);
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/start-own-build', undefined, expect.anything()));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/work-orders/work-order-3'));
  });

  it('offers no start to someone who only reads quotes', async () => {
    const quote = quoteStub({}, { forMyself: true });
    vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: url.startsWith('/quotes/quote-7') ? quote : {} }));
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite={false} timeZone="UTC" />);
    expect(await screen.findByText(/Q-0007/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start my build' })).toBeNull();
  });
});
