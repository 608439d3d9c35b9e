import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { Quote } from '../../types';
import { ProjectQuotesCard } from '../project-quotes-card';
import { SendQuoteConfirm } from '../send-quote-confirm';
import { QuoteWorkspace } from '../quote-workspace';
import { LINES, quoteStub } from './quote-stub';

/** What the start-my-build confirmation reads about the project: the newest fit report, the plan, the sheet. */
interface ProjectFacts {
  counts?: { unknown: number; fails: number };
  unresolved?: { title: string }[];
  measured?: boolean;
}

const CLEAN: ProjectFacts = { counts: { unknown: 0, fails: 0 }, unresolved: [], measured: true };

function mockGets(quote: Quote, { counts, unresolved, measured }: ProjectFacts = CLEAN) {
  const answers: Record<string, unknown> = {
    '/projects/project-1/quotes': [quote],
    '/quotes/quote-7': quote,
    '/projects/project-1/fit-reports': { items: counts ? [{ id: 'report-1', counts: { total: 20, ok: 20 - counts.unknown - counts.fails, tight: 0, ...counts } }] : [] },
    '/projects/project-1/parts-plans': [{ id: 'plan-1', result: { unresolved: unresolved ?? [] } }],
    '/projects/project-1/measurement-sheet': { values: measured ? [{ pointId: 'ride-height' }] : [], missing: [] },
  };
  return vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => ({ data: answers[url] ?? {} }));
}

function renderCard(quote: Quote, canWrite = true, facts?: ProjectFacts) {
  mockGets(quote, facts);
  return renderWithApp(<ProjectQuotesCard projectId="project-1" canWrite={canWrite} forMyself={quote.forMyself} />);
}

/** The confirmation's own button, once it has read what is still open. */
async function confirmButton(name: string) {
  const button = (await screen.findAllByRole('button', { name })).at(-1)!;
  await waitFor(() => expect(button).toBeEnabled());
  return button;
}

describe('ProjectQuotesCard: sending a quote', () => {
  it("offers to send a customer's quote and sends it once confirmed: to whom, the total and the deposit", async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: quoteStub({ sent: true }, { status: 'awaiting-answer', sentRevision: 1 }) });
    renderCard(quoteStub());
    await userEvent.click(await screen.findByRole('button', { name: 'Send to customer' }));
    // The e-mail goes out on confirmation only, and the confirmation says where and for how much.
    expect(await screen.findByText('Send revision 1 of Q-0007 to Marlo Penhallow?')).toBeInTheDocument();
    expect(screen.getByTestId('send-quote-confirm')).toHaveTextContent(
      'It is e-mailed to Marlo Penhallow (marlo@penhallow.test) with the PDF: total $1,810.71, deposit on approval $543.21.',
    );
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Send' }));
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
    // the card of one's own truck speaks of a budget
    expect(screen.getByText('Budget', { selector: '.ant-card-head-title' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Draft a budget' })).toBeInTheDocument();
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
    await userEvent.click(await confirmButton('Start my build'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/start-own-build', undefined, expect.anything()));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/work-orders/work-order-3'));
  });

  it('lists what is still open on a new builder’s budget, each with where to fix it, and starts anyway on their word', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: STARTED });
    const budget = quoteStub({ laborRateCents: 0, lines: [{ ...LINES[0], unitPriceCents: 0, lineTotalCents: 0 }, LINES[2]] }, { forMyself: true });
    renderCard(budget, true, { counts: { unknown: 11, fails: 0 }, unresolved: [{ title: 'Motor mounts' }], measured: false });
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    const open = await screen.findByTestId('own-build-open-items');
    expect(open).toHaveTextContent('Labor is counted at $0 per hour: 8.5 h of your own time.');
    expect(open).toHaveTextContent('1 part line is priced at $0.00: Rear-sump oil pan.');
    expect(open).toHaveTextContent('The parts plan could not match parts for 1 need: Motor mounts.');
    expect(open).toHaveTextContent('11 fit checks could not run: they need measurements or other input.');
    expect(open).toHaveTextContent('The chassis has not been measured');
    expect(within(open).getByRole('link', { name: /set a labor rate in shop settings/ })).toHaveAttribute('href', '/settings/shop');
    expect(within(open).getByRole('link', { name: 'Measure the chassis' })).toHaveAttribute('href', '/projects/project-1/measurements');
    expect(within(open).getAllByRole('link', { name: 'Open the fit check' })[0]).toHaveAttribute('href', '/projects/project-1/fit');
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(await confirmButton('Start anyway'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/start-own-build', undefined, expect.anything()));
  });

  it('keeps "Start my build" when only the $0 labor note is there: the builder’s own time is fine', async () => {
    renderCard(quoteStub({ laborRateCents: 0 }, { forMyself: true }));
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    expect(await screen.findByText(/Labor is counted at \$0 per hour: 9\.8 h of your own time\./)).toBeInTheDocument();
    expect(await confirmButton('Start my build')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start anyway' })).toBeNull();
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
    await userEvent.click(await confirmButton('Start my build'));
    expect(await screen.findByText(/Your build was already started from this budget/)).toBeInTheDocument();
    expect(screen.getByTestId('location')).toHaveTextContent(/^\/$/);
  });
});

describe('QuoteWorkspace: sending a quote of one’s own truck', () => {
  it('puts the reason in place of the send button', async () => {
    const quote = quoteStub({}, { forMyself: true });
    mockGets(quote);
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    expect(await screen.findByTestId('own-truck-quote-note')).toHaveTextContent('Your own truck: no customer to send this quote to.');
    expect(screen.queryByRole('button', { name: /^Send revision/ })).toBeNull();
  });

  it('offers to start the build in its place and opens the work order', async () => {
    const quote = quoteStub({}, { forMyself: true });
    mockGets(quote);
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: STARTED });
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Start my build' }));
    await userEvent.click(await confirmButton('Start my build'));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/start-own-build', undefined, expect.anything()));
    await waitFor(() => expect(screen.getByTestId('location')).toHaveTextContent('/work-orders/work-order-3'));
  });

  it('says labor is counted at $0 per hour as the builder’s own time, with where to set a rate for paid help', async () => {
    mockGets(quoteStub({ laborRateCents: 0 }, { forMyself: true }));
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    const note = await screen.findByTestId('own-time-labor');
    // Hand-added from the stub's labor lines: 8.5 h + 1.3 h = 9.8 h.
    expect(note).toHaveTextContent('Labor is counted at $0 per hour: 9.8 h of your own time.');
    expect(within(note).getByRole('link', { name: /set a labor rate in shop settings/ })).toHaveAttribute('href', '/settings/shop');
  });

  it('offers no start to someone who only reads quotes', async () => {
    const quote = quoteStub({}, { forMyself: true });
    mockGets(quote);
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite={false} timeZone="UTC" />);
    expect(await screen.findByText(/Q-0007/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Start my build' })).toBeNull();
  });
});

describe('QuoteWorkspace: sending a revision to the customer', () => {
  it('asks first, naming the customer, their e-mail, the total and the deposit, and sends on confirmation', async () => {
    const quote = quoteStub();
    mockGets(quote);
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: quoteStub({ sent: true }, { status: 'awaiting-answer', sentRevision: 1 }) });
    renderWithApp(<QuoteWorkspace quoteId="quote-7" canWrite timeZone="UTC" />);
    await userEvent.click(await screen.findByRole('button', { name: 'Send revision 1 to the customer' }));
    expect(await screen.findByTestId('send-quote-confirm')).toHaveTextContent('Marlo Penhallow (marlo@penhallow.test)');
    expect(screen.getByTestId('send-quote-confirm')).toHaveTextContent('total $1,810.71, deposit on approval $543.21');
    expect(screen.queryByTestId('send-quote-free-lines')).toBeNull();
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Not yet' }));
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(screen.getByRole('button', { name: 'Send revision 1 to the customer' }));
    await userEvent.click(await screen.findByRole('button', { name: 'Send' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/send', undefined, expect.anything()));
  });
});

describe('SendQuoteConfirm: lines at nothing', () => {
  it('names the lines the customer would read at $0.00 before the quote goes', async () => {
    const quote = quoteStub();
    const lines = quote.revision.lines.map((line) => (line.key === 'line-install' ? { ...line, hours: 0, lineTotalCents: 0 } : line));
    render(quoteStub({ lines }));
    await userEvent.click(screen.getByRole('button', { name: 'Send' }));
    expect(await screen.findByTestId('send-quote-free-lines')).toHaveTextContent('1 line reads $0.00 to the customer: Install pan and pickup.');
  });

  function render(quote: ReturnType<typeof quoteStub>) {
    renderWithApp(
      <SendQuoteConfirm quote={quote} onConfirm={() => undefined}>
        <button type="button">Send</button>
      </SendQuoteConfirm>,
    );
  }
});
