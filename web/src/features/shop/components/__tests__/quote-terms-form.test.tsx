import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import type { QuoteSettings } from '../../types';
import { QuoteTermsForm, quoteTermsChanges } from '../quote-terms-form';

const stored: QuoteSettings = {
  laborTaxPercent: 0,
  suppliesCapCents: 7500,
  depositPercent: 30,
  validityDays: 30,
  defaultMarkupPercent: 30,
  terms: 'Prices hold until the date shown.',
};

describe('quoteTermsChanges', () => {
  it('sends only what changed, the supplies cap in cents, and an emptied cap as no cap', () => {
    expect(quoteTermsChanges(stored, { ...stored, suppliesCap: 75 })).toEqual({});
    expect(quoteTermsChanges(stored, { ...stored, suppliesCap: 120.5, depositPercent: 25 })).toEqual({ suppliesCapCents: 12050, depositPercent: 25 });
    expect(quoteTermsChanges(stored, { ...stored, suppliesCap: null, terms: '  New terms. ' })).toEqual({ suppliesCapCents: null, terms: 'New terms.' });
  });
});

describe('QuoteTermsForm', () => {
  it('shows the stored terms and saves a changed deposit', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: stored });
    const put = vi.spyOn(apiClient, 'put').mockImplementation(async (_url, body) => ({ data: { ...stored, ...(body as object) } }));
    renderWithApp(<QuoteTermsForm canEdit />);

    const deposit = (await screen.findByRole('spinbutton', { name: 'Deposit' })) as HTMLInputElement;
    await waitFor(() => expect(deposit.value).toBe('30.00'));
    expect((screen.getByRole('spinbutton', { name: 'Shop supplies cap' }) as HTMLInputElement).value).toBe('75.00');

    await userEvent.clear(deposit);
    await userEvent.type(deposit, '25');
    await userEvent.click(screen.getByRole('button', { name: 'Save quote terms' }));
    await waitFor(() => expect(put).toHaveBeenCalledWith('/quote-settings', { depositPercent: 25 }, expect.anything()));
  });

  it('refuses a deposit over the whole total and says the range', async () => {
    vi.spyOn(apiClient, 'get').mockResolvedValue({ data: stored });
    const put = vi.spyOn(apiClient, 'put');
    renderWithApp(<QuoteTermsForm canEdit />);
    const deposit = (await screen.findByRole('spinbutton', { name: 'Deposit' })) as HTMLInputElement;
    await waitFor(() => expect(deposit.value).toBe('30.00'));
    await userEvent.clear(deposit);
    await userEvent.type(deposit, '140');
    await userEvent.click(screen.getByRole('button', { name: 'Save quote terms' }));
    expect(await screen.findByText('Between 0 and 100 %')).toBeInTheDocument();
    expect(put).not.toHaveBeenCalled();
  });
});
