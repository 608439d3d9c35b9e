import type { AxiosAdapter, InternalAxiosRequestConfig } from 'axios';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { sessionStub } from '@/test/fixtures';
import { apiClient, setUnauthorizedHandler } from '../api-client';
import { tokenStorage } from '../token-storage';

type Seen = { url?: string; auth?: string };

function respond(config: InternalAxiosRequestConfig, status: number, data: unknown) {
  const response = { data, status, statusText: String(status), headers: {}, config };
  if (status >= 400) {
    const error = Object.assign(new Error(`Request failed with status code ${status}`), {
      isAxiosError: true,
      config,
      response,
      toJSON: () => ({}),
    });
    return Promise.reject(error);
  }
  return Promise.resolve(response);
}

describe('apiClient 401 handling', () => {
  const realAdapter = apiClient.defaults.adapter;
  let seen: Seen[];
  let onUnauthorized: ReturnType<typeof vi.fn<(next: string) => void>>;

  beforeEach(() => {
    seen = [];
    onUnauthorized = vi.fn<(next: string) => void>();
    setUnauthorizedHandler(onUnauthorized);
    tokenStorage.set({ accessToken: 'expired', refreshToken: 'refresh-old' });
  });
  afterEach(() => {
    apiClient.defaults.adapter = realAdapter;
  });

  it('refreshes once, retries the request with the new token and keeps the new pair', async () => {
    const adapter: AxiosAdapter = (config) => {
      seen.push({ url: config.url, auth: config.headers.Authorization as string | undefined });
      if (config.url === '/auth/refresh') return respond(config, 200, { ...sessionStub, accessToken: 'fresh', refreshToken: 'refresh-new' });
      return config.headers.Authorization === 'Bearer fresh' ? respond(config, 200, { ok: true }) : respond(config, 401, { code: 'token_expired', message: 'Sign in again' });
    };
    apiClient.defaults.adapter = adapter;

    const { data } = await apiClient.get('/customers');

    expect(data).toEqual({ ok: true });
    expect(seen.map((s) => s.url)).toEqual(['/customers', '/auth/refresh', '/customers']);
    expect(seen[1].auth).toBeUndefined();
    expect(tokenStorage.getAccessToken()).toBe('fresh');
    expect(tokenStorage.getRefreshToken()).toBe('refresh-new');
    expect(onUnauthorized).not.toHaveBeenCalled();
  });

  it('sends the person to sign-in when the refresh token is refused too', async () => {
    apiClient.defaults.adapter = (config) => {
      seen.push({ url: config.url });
      return respond(config, 401, { code: 'unauthorized', message: 'Sign in again' });
    };

    await expect(apiClient.get('/projects')).rejects.toMatchObject({ response: { status: 401 } });

    expect(seen.map((s) => s.url)).toEqual(['/projects', '/auth/refresh']);
    expect(tokenStorage.getAccessToken()).toBeNull();
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });
});
