import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { quoteKeys } from '@/features/quotes/api/quote-keys';
import { createTestQueryClient, renderWithApp } from '@/test/render';
import { timeZoneMatches, timeZoneOptions } from '../../time-zones';
import type { Shop } from '../../types';
import { ShopSettingsForm } from '../shop-settings-form';

const shop: Shop = {
  view: 'full',
  id: 'shop-ironbark',
  name: 'Ironbark Swap Works',
  unitSystem: 'in',
  currency: 'USD',
  timeZone: 'America/Denver',
  laborRatePerHour: 135,
  taxRatePercent: 8.25,
  shopSuppliesPercent: 4,
};

describe('the time zone choices', () => {
  it('offer UTC first and every zone the browser knows, and keep a stored zone it does not list', () => {
    const options = timeZoneOptions('America/Denver');
    expect(options[0]).toEqual({ value: 'UTC', label: 'UTC' });
    // Source: IANA tz database zone names (listed by ECMA-402 Intl.supportedValuesOf('timeZone')).
    expect(options.map((option) => option.value)).toEqual(expect.arrayContaining(['America/Denver', 'Pacific/Kiritimati', 'Pacific/Pago_Pago']));
    expect(timeZoneOptions('Etc/Unlisted')[0].value).toBe('Etc/Unlisted');
  });

  it('are found by a city typed with spaces, in any case', () => {
    expect(timeZoneMatches('new york', { value: 'America/New_York' })).toBe(true);
    expect(timeZoneMatches('DENVER', { value: 'America/Denver' })).toBe(true);
    expect(timeZoneMatches('denver', { value: 'Europe/Berlin' })).toBe(false);
  });
});

describe('ShopSettingsForm: time zone for quote dates', () => {
  it("shows the shop's zone and saves a zone chosen by searching", async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockImplementation(async (_url, body) => ({ data: { ...shop, ...(body as object) } }));
    renderWithApp(<ShopSettingsForm shop={shop} canEdit />);

    const select = screen.getByRole('combobox', { name: 'Time zone for quote dates' });
    await waitFor(() => expect(screen.getByTitle('America/Denver')).toBeInTheDocument());
    await userEvent.click(select);
    await userEvent.type(select, 'kiritimati');
    await userEvent.click(await screen.findByTitle('Pacific/Kiritimati'));
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/shops/current', { timeZone: 'Pacific/Kiritimati' }, expect.anything()));
  });

  it('shows the zone to a member who may not change it, without a way to save', () => {
    renderWithApp(<ShopSettingsForm shop={shop} canEdit={false} />);
    expect(screen.getByRole('combobox', { name: 'Time zone for quote dates' })).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save settings' })).toBeNull();
  });
});

describe('ShopSettingsForm: rates for quotes', () => {
  it('saves a new labor rate and has open quotes read again, since the drafts were repriced with it', async () => {
    const patch = vi.spyOn(apiClient, 'patch').mockImplementation(async (_url, body) => ({ data: { ...shop, ...(body as object) } }));
    const queryClient = createTestQueryClient();
    queryClient.setQueryData(quoteKeys.detail('quote-7'), { id: 'quote-7' });
    renderWithApp(<ShopSettingsForm shop={shop} canEdit />, { queryClient });
    expect(screen.getByText(/Quotes still being written .* take new rates when you save/)).toBeInTheDocument();
    const rate = screen.getByRole('spinbutton', { name: 'Labor rate per hour' });
    await userEvent.clear(rate);
    await userEvent.type(rate, '150');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() => expect(patch).toHaveBeenCalledWith('/shops/current', { laborRatePerHour: 150 }, expect.anything()));
    await waitFor(() => expect(queryClient.getQueryState(quoteKeys.detail('quote-7'))?.isInvalidated).toBe(true));
  });
});
