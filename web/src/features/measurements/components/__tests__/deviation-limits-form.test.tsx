import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosError, AxiosHeaders } from 'axios';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { renderWithApp } from '@/test/render';
import { DeviationLimitsForm } from '../deviation-limits-form';

function serveSettings(settings = { deviationLimitMm: 15, deviationLimitDeg: 1 }) {
  return vi.spyOn(apiClient, 'get').mockImplementation(async (url: string) => {
    if (url === '/measurement-settings') return { data: settings };
    throw new Error(`unexpected GET ${url}`);
  });
}

const lengthBox = () => screen.getByRole('textbox', { name: 'Length limit' }) as HTMLInputElement;
const angleBox = () => screen.getByRole('spinbutton', { name: 'Angle limit' }) as HTMLInputElement;

describe('the shop sets when a measured reading is flagged', () => {
  afterEach(() => vi.restoreAllMocks());

  it('shows the stored limits in the person’s unit and saves a fraction of an inch as millimetres', async () => {
    serveSettings();
    const put = vi.spyOn(apiClient, 'put').mockResolvedValue({ data: { deviationLimitMm: 12.7, deviationLimitDeg: 0.5 } });
    renderWithApp(<DeviationLimitsForm canEdit />);
    // Source: NIST SP 811 (2008) B.8: 1 in = 25.4 mm exactly; 15 mm = 0.5906 in, shown to 0.01.
    await waitFor(() => expect(lengthBox().value).toBe('0.59'));
    expect(angleBox().value).toBe('1.00');

    fireEvent.change(lengthBox(), { target: { value: '1/2' } });
    fireEvent.change(angleBox(), { target: { value: '0.5' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save limits' }));
    // 1/2 in × 25.4 = 12.7 mm.
    await waitFor(() => expect(put).toHaveBeenCalledWith('/measurement-settings', { deviationLimitMm: 12.7, deviationLimitDeg: 0.5 }, expect.anything()));
  });

  it('refuses limits outside what the API takes, saying the bounds, and sends nothing', async () => {
    serveSettings();
    const put = vi.spyOn(apiClient, 'put');
    renderWithApp(<DeviationLimitsForm canEdit />);
    await waitFor(() => expect(lengthBox().value).toBe('0.59'));

    fireEvent.change(lengthBox(), { target: { value: '0.2 mm' } });
    fireEvent.change(angleBox(), { target: { value: '45' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save limits' }));
    expect(await screen.findByText(/Length limit must be at least .*\(0\.5 mm\)\./)).toBeInTheDocument();
    expect(await screen.findByText('Angle limit must be at most 20°.')).toBeInTheDocument();

    fireEvent.change(lengthBox(), { target: { value: 'a bit' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save limits' }));
    expect((await screen.findAllByText(/cannot read that as a length/)).length).toBeGreaterThan(0);
    expect(put).not.toHaveBeenCalled();
  });

  it('shows what the API answers when it refuses', async () => {
    serveSettings();
    const body = { statusCode: 400, code: 'validation_failed', message: 'deviationLimitMm must be at least 0.5 mm', details: ['deviationLimitMm must be at least 0.5 mm'] };
    vi.spyOn(apiClient, 'put').mockRejectedValue(
      new AxiosError('Bad Request', 'ERR_BAD_REQUEST', undefined, undefined, { status: 400, data: body, statusText: 'Bad Request', headers: {}, config: { headers: new AxiosHeaders() } }),
    );
    renderWithApp(<DeviationLimitsForm canEdit />);
    await waitFor(() => expect(lengthBox().value).toBe('0.59'));
    await userEvent.click(screen.getByRole('button', { name: 'Save limits' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('deviationLimitMm must be at least 0.5 mm');
  });

  it('is read-only for staff other than the owner', async () => {
    serveSettings({ deviationLimitMm: 20, deviationLimitDeg: 1.5 });
    renderWithApp(<DeviationLimitsForm canEdit={false} />);
    await waitFor(() => expect(angleBox().value).toBe('1.50'));
    expect(lengthBox()).toBeDisabled();
    expect(screen.queryByRole('button', { name: 'Save limits' })).not.toBeInTheDocument();
    expect(screen.getByText('The shop owner sets these limits.')).toBeInTheDocument();
  });
});
