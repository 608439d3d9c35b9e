import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError } from 'axios';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { userStub } from '@/test/fixtures';
import { authKeys } from '@/features/auth/api/auth-keys';
import { quoteStub } from '@/features/quotes/components/__tests__/quote-stub';
import type { Quote } from '@/features/quotes/types';
import { RequireRole } from '../../../guards';
import { sectionRoles } from '../../../navigation';
import { QuotePage } from '../quote-page';

// Revision 1 of the hand-worked quote (api/test/quotes.e2e-spec.ts) as the API shows it to its customer once sent.
const SENT: Quote = quoteStub(
  { sent: true, sentAt: '2026-12-03T03:10:00.000Z', terms: 'Deposit due on approval.\nBalance due when the truck leaves the bay.' },
  { status: 'awaiting-answer', sentRevision: 1, revisions: [{ number: 1, sentAt: '2026-12-03T03:10:00.000Z', totalCents: 181071 }] },
);

function renderAsCustomer(quoteId = 'quote-7') {
  const queryClient = createTestQueryClient();
  queryClient.setQueryData(authKeys.me(), userStub('customer'));
  return renderWithApp(
    <Routes>
      <Route
        path="/quotes/:quoteId"
        element={
          <RequireRole roles={sectionRoles.quoteDetail}>
            <QuotePage />
          </RequireRole>
        }
      />
    </Routes>,
    { route: `/quotes/${quoteId}`, queryClient },
  );
}

afterEach(() => vi.restoreAllMocks());

describe("the signed-in customer's quote", () => {
  it('shows the sent revision as the e-mailed page does (no cost or markup) with its terms, then accepts after a confirmation and offers the deposit', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: SENT });
    const post = vi.spyOn(apiClient, 'post').mockImplementation(async (url: string) => {
      if (url === '/quotes/quote-7/answer') return { data: { ...SENT, status: 'approved', depositState: 'due', answeredAt: '2026-12-03T04:00:00.000Z' } };
      if (url === '/quotes/quote-7/deposit') return { data: { state: 'processing' } };
      throw new Error(`unexpected POST ${url}`);
    });
    renderAsCustomer();

    // Totals as the API priced them (hand-checked in quote-stub.ts): total $1,810.71, deposit 30 % = $543.21.
    expect(await screen.findByTestId('quote-total')).toHaveTextContent('$1,810.71');
    expect(screen.getByTestId('quote-deposit')).toHaveTextContent('$543.21');
    expect(screen.getByTestId('answer-money')).toHaveTextContent(/deposit of \$543\.21 of the \$1,810\.71 total/);
    expect(screen.getByTestId('quote-terms')).toHaveTextContent('Balance due when the truck leaves the bay.');
    expect(screen.getAllByText('Pickup tube and screen').length).toBeGreaterThan(0);
    // the pickup's cost ($41.37) and markup (35 %) stay with the shop
    expect(screen.queryByText(/41\.37/)).not.toBeInTheDocument();
    expect(screen.queryByText(/35 ?%/)).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Send|Start revision/ })).not.toBeInTheDocument();

    await userEvent.click(screen.getByRole('button', { name: 'Accept this quote' }));
    const confirm = await screen.findByRole('tooltip');
    expect(confirm).toHaveTextContent('Accept quote Q-0007 for $1,810.71?');
    expect(confirm).toHaveTextContent('The deposit of $543.21 is then asked for.');
    expect(post).not.toHaveBeenCalled();
    await userEvent.click(within(confirm).getByRole('button', { name: 'Accept' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/answer', { answer: 'accept' }, expect.anything()));

    const card = await screen.findByLabelText('Card number (local test payment service)');
    await userEvent.type(card, '4242 4242 4242 4242');
    await userEvent.click(screen.getByRole('button', { name: 'Pay the deposit' }));
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/deposit', { paymentMethod: 'pm_card_visa' }, expect.anything()));
    expect(await screen.findByText(/waiting for the payment service to confirm it/)).toBeInTheDocument();
  });

  it('downloads the PDF through the signed-in session (a plain link would carry no sign-in)', async () => {
    const get = vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => (url.endsWith('/pdf') ? { data: new Blob(['%PDF-1.7'], { type: 'application/pdf' }) } : { data: SENT }));
    const createObjectURL = vi.fn(() => 'blob:quote-7');
    Object.assign(URL, { createObjectURL, revokeObjectURL: vi.fn() });
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    renderAsCustomer();

    await userEvent.click(await screen.findByRole('button', { name: 'Download the quote as a PDF' }));
    await waitFor(() => expect(get).toHaveBeenCalledWith('/quotes/quote-7/pdf', { responseType: 'blob', params: { revision: 1 } }));
    await waitFor(() => expect(click).toHaveBeenCalled());
    expect(createObjectURL).toHaveBeenCalledWith(expect.any(Blob));
    expect((click.mock.contexts[0] as HTMLAnchorElement).download).toBe('quote-Q-0007-revision-1.pdf');
  });

  it('declines with a reason the shop reads', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: SENT });
    const reason = 'We will keep the original engine this year.';
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { ...SENT, status: 'turned-down', declineReason: reason } });
    renderAsCustomer();

    await userEvent.click(await screen.findByRole('button', { name: 'Decline…' }));
    const decline = screen.getByRole('button', { name: 'Decline the quote' });
    expect(decline).toBeDisabled();
    await userEvent.type(screen.getByLabelText(/Why are you declining/), reason);
    await userEvent.click(decline);
    await waitFor(() => expect(post).toHaveBeenCalledWith('/quotes/quote-7/answer', { answer: 'decline', reason }, expect.anything()));
    expect(await screen.findByText('You declined this quote. The shop has been told.')).toBeInTheDocument();
  });

  it("shows not found, and nothing of the quote, for another customer's quote id", async () => {
    vi.spyOn(apiClient, 'get').mockRejectedValue(
      new AxiosError('404', 'ERR_BAD_REQUEST', undefined, undefined, {
        status: 404,
        statusText: 'Not Found',
        headers: {},
        config: {} as never,
        data: { statusCode: 404, error: 'Not Found', code: 'quote_not_found', message: 'No such quote in this shop.' },
      }),
    );
    const post = vi.spyOn(apiClient, 'post');
    renderAsCustomer('quote-of-someone-else');

    expect(await screen.findByText('Not found in this shop')).toBeInTheDocument();
    // the page says it once: no error notice pops up beside it
    expect(apiClient.get).toHaveBeenCalledWith('/quotes/quote-of-someone-else', expect.objectContaining({ skipErrorNotification: true }));
    expect(screen.queryByText(/Not part of your role|cannot open this/)).not.toBeInTheDocument();
    expect(screen.queryByTestId('quote-total')).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Accept this quote' })).not.toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });
});
