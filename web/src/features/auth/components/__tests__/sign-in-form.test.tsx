import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { apiClient } from '@/lib/api-client';
import { tokenStorage } from '@/lib/token-storage';
import { renderWithApp } from '@/test/render';
import { sessionStub } from '@/test/fixtures';
import { SignInForm } from '../sign-in-form';

describe('SignInForm', () => {
  it('shows a message for each empty field and sends nothing', async () => {
    const post = vi.spyOn(apiClient, 'post');
    renderWithApp(<SignInForm />);

    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Enter your email address')).toBeInTheDocument();
    expect(screen.getByText('Enter your password')).toBeInTheDocument();
    expect(post).not.toHaveBeenCalled();
  });

  it('refuses an address that is not an email', async () => {
    renderWithApp(<SignInForm />);
    await userEvent.type(screen.getByLabelText('Email'), 'not-an-address');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/Enter a valid email address/)).toBeInTheDocument();
  });

  it('posts the credentials, stores the session and reports success', async () => {
    const post = vi.spyOn(apiClient, 'post').mockResolvedValue({ data: sessionStub });
    const onSignedIn = vi.fn();
    const { queryClient } = renderWithApp(<SignInForm onSignedIn={onSignedIn} />);

    await userEvent.type(screen.getByLabelText('Email'), '  wrenna@ironbark.example ');
    await userEvent.type(screen.getByLabelText('Password'), 'correct horse');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(onSignedIn).toHaveBeenCalledWith(sessionStub));
    expect(post).toHaveBeenCalledWith(
      '/auth/sign-in',
      { email: 'wrenna@ironbark.example', password: 'correct horse' },
      expect.objectContaining({ skipAuthRefresh: true }),
    );
    expect(tokenStorage.getAccessToken()).toBe('access-token-1');
    expect(tokenStorage.getRefreshToken()).toBe('refresh-token-1');
    expect(queryClient.getQueryData(['auth', 'me'])).toEqual(sessionStub.user);
  });

  it('shows the server’s refusal in words a person can act on', async () => {
    const { AxiosError } = await import('axios');
    const error = new AxiosError('401', 'ERR_BAD_REQUEST', undefined, undefined, {
      status: 401,
      statusText: 'Unauthorized',
      headers: {},
      config: {} as never,
      data: { statusCode: 401, error: 'Unauthorized', code: 'invalid_credentials', message: 'Wrong email or password' },
    });
    vi.spyOn(apiClient, 'post').mockRejectedValue(error);
    renderWithApp(<SignInForm />);

    await userEvent.type(screen.getByLabelText('Email'), 'wrenna@ironbark.example');
    await userEvent.type(screen.getByLabelText('Password'), 'wrong one');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByRole('alert')).toBeInTheDocument();
    expect(screen.getByText(/do not match an account/)).toBeInTheDocument();
    expect(tokenStorage.getAccessToken()).toBeNull();
  });
});
