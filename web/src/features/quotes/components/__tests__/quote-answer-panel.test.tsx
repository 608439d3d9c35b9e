import { screen } from '@testing-library/react';
import { AxiosError } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { QuoteAnswerPanel } from '../quote-answer-panel';

const refusal = (status: number, code: string, message: string) =>
  new AxiosError(String(status), 'ERR_BAD_REQUEST', undefined, undefined, {
    status,
    statusText: '',
    headers: {},
    config: {} as never,
    data: { statusCode: status, error: '', code, message, details: [], correlationId: 'c-1' },
  });

describe('QuoteAnswerPanel opened from an older e-mail', () => {
  it('says the quote was already accepted, with the days, rather than that the link cannot be opened', async () => {
    const message = 'This quote was already accepted on Nov 30, 2026 (revision 2), and the deposit was paid on Dec 1, 2026. There is nothing more to do with this link; the shop will be in touch about the work.';
    vi.spyOn(apiClient, 'get').mockRejectedValue(refusal(409, 'quote_link_already_accepted', message));
    renderWithApp(<QuoteAnswerPanel token="a.b.c" />);
    expect(await screen.findByText('This quote was already accepted')).toBeInTheDocument();
    expect(screen.getByText(message)).toBeInTheDocument();
    expect(screen.queryByText('This quote link cannot be opened')).toBeNull();
  });

  it('still says a superseded link cannot be opened while the newer revision waits for an answer', async () => {
    vi.spyOn(apiClient, 'get').mockRejectedValue(refusal(409, 'quote_link_superseded', 'The shop has sent a newer revision of this quote; open the link in the newest e-mail.'));
    renderWithApp(<QuoteAnswerPanel token="a.b.c" />);
    expect(await screen.findByText('This quote link cannot be opened')).toBeInTheDocument();
  });
});
