import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { doubleClick, expectSentOnce, heldAnswer } from '@/test/double-click';
import { renderWithApp } from '@/test/render';
import { SignUpForm } from '../sign-up-form';

afterEach(() => vi.restoreAllMocks());

describe('SignUpForm', () => {
  it("sends the browser's time zone with the new shop, so its quotes are dated by the owner's own day", async () => {
    const resolved = Intl.DateTimeFormat().resolvedOptions();
    vi.spyOn(Intl.DateTimeFormat.prototype, 'resolvedOptions').mockReturnValue({ ...resolved, timeZone: 'America/Denver' });
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: { message: 'Check your e-mail.' } });
    renderWithApp(<SignUpForm />);

    await userEvent.type(screen.getByLabelText('Your name'), 'Pell Varga');
    await userEvent.type(screen.getByLabelText('Shop or garage name'), 'Varga Barn');
    await userEvent.type(screen.getByLabelText('Email'), 'pell@varga.example');
    await userEvent.type(screen.getByLabelText('Password'), 'zone-password-1');
    await userEvent.type(screen.getByLabelText('Repeat password'), 'zone-password-1');
    await userEvent.click(screen.getByRole('button', { name: 'Create shop' }));

    await waitFor(() =>
      expect(post).toHaveBeenCalledWith(
        '/auth/sign-up',
        { name: 'Pell Varga', shopName: 'Varga Barn', email: 'pell@varga.example', password: 'zone-password-1', timeZone: 'America/Denver' },
        expect.anything(),
      ),
    );
  });

  it('sends one sign-up (one e-mail) on a double-click of Create shop', async () => {
    const answer = heldAnswer<{ data: { message: string } }>();
    const post = vi.spyOn(apiClient, 'post').mockImplementation(() => answer.promise);
    renderWithApp(<SignUpForm />);
    await userEvent.type(screen.getByLabelText('Your name'), 'Merrin Tolland');
    await userEvent.type(screen.getByLabelText('Shop or garage name'), 'Ironbark Swap Works');
    await userEvent.type(screen.getByLabelText('Email'), 'merrin@ironbark.example');
    await userEvent.type(screen.getByLabelText('Password'), 'correct horse battery');
    await userEvent.type(screen.getByLabelText('Repeat password'), 'correct horse battery');

    doubleClick(screen.getByRole('button', { name: 'Create shop' }));
    await expectSentOnce(post, '/auth/sign-up');

    answer.resolve({ data: { message: 'We sent a link to merrin@ironbark.example.' } });
    expect(await screen.findByText('Check your e-mail')).toBeInTheDocument();
    expect(screen.getByText(/^We sent merrin@ironbark.example a link to finish creating your shop./)).toBeInTheDocument();
    expect(post).toHaveBeenCalledTimes(1);
  });
});
