import axios, { AxiosError, type AxiosInstance, type InternalAxiosRequestConfig } from 'axios';
import { env } from '@/config/env';
import { paths, toSignIn } from '@/config/paths';
import { getErrorMessage, getApiErrorBody } from '@/lib/api-error';
import { notifyError } from '@/lib/notifier';
import { tokenStorage } from '@/lib/token-storage';
import type { Session } from '@/lib/api-types';

declare module 'axios' {
  interface AxiosRequestConfig {
    /** Do not show the global error notification (the caller shows the error itself). */
    skipErrorNotification?: boolean;
    /** Do not try the refresh token on 401 (sign-in, refresh and other public auth routes). */
    skipAuthRefresh?: boolean;
  }
}

type RetriableConfig = InternalAxiosRequestConfig & { _retried?: boolean };

export type UnauthorizedHandler = (next: string) => void;

let unauthorizedHandler: UnauthorizedHandler = (next) => {
  window.location.assign(toSignIn(next));
};

/** The router registers a navigate-based handler so the redirect keeps the SPA state. */
export function setUnauthorizedHandler(handler: UnauthorizedHandler): void {
  unauthorizedHandler = handler;
}

const sessionListeners = new Set<(session: Session | null) => void>();

/** Called with the new session after a refresh, or null when the session ended. */
export function onSessionChange(listener: (session: Session | null) => void): () => void {
  sessionListeners.add(listener);
  return () => sessionListeners.delete(listener);
}

export const apiClient: AxiosInstance = axios.create({
  baseURL: env.apiUrl,
  headers: { Accept: 'application/json' },
  timeout: 20_000,
});

apiClient.interceptors.request.use((config) => {
  const token = tokenStorage.getAccessToken();
  // Public auth routes (sign-in, refresh…) go without a possibly expired bearer.
  if (token && !config.skipAuthRefresh && !config.headers.Authorization) {
    config.headers.Authorization = `Bearer ${token}`;
  }
  return config;
});

// One refresh at a time: parallel 401s wait for the same promise.
let refreshInFlight: Promise<string> | null = null;

async function refreshAccessToken(): Promise<string> {
  const refreshToken = tokenStorage.getRefreshToken();
  if (!refreshToken) throw new Error('No refresh token');
  const { data } = await apiClient.post<Session>(
    '/auth/refresh',
    { refreshToken },
    { skipAuthRefresh: true, skipErrorNotification: true },
  );
  tokenStorage.set({ accessToken: data.accessToken, refreshToken: data.refreshToken });
  sessionListeners.forEach((listener) => listener(data));
  return data.accessToken;
}

function endSession(): void {
  tokenStorage.clear();
  sessionListeners.forEach((listener) => listener(null));
  const here = window.location.pathname + window.location.search;
  const onPublicPage = [paths.signIn, paths.signUp, paths.resetPassword, paths.acceptInvite].some((p) =>
    window.location.pathname.startsWith(p),
  );
  if (!onPublicPage) unauthorizedHandler(here);
}

apiClient.interceptors.response.use(
  (response) => response,
  async (error: AxiosError) => {
    const config = error.config as RetriableConfig | undefined;
    const status = error.response?.status;

    if (status === 401 && config && !config.skipAuthRefresh) {
      if (!config._retried && tokenStorage.getRefreshToken()) {
        config._retried = true;
        try {
          refreshInFlight ??= refreshAccessToken().finally(() => {
            refreshInFlight = null;
          });
          const accessToken = await refreshInFlight;
          config.headers.Authorization = `Bearer ${accessToken}`;
          return apiClient(config);
        } catch {
          // fall through: the refresh token is gone or refused
        }
      }
      endSession();
      return Promise.reject(error);
    }

    if (!config?.skipErrorNotification && !axios.isCancel(error)) {
      const body = getApiErrorBody(error);
      notifyError({
        title: titleFor(status),
        description: getErrorMessage(error),
        reference: body?.correlationId || undefined,
        key: body?.correlationId,
      });
    }
    return Promise.reject(error);
  },
);

function titleFor(status: number | undefined): string {
  if (!status) return 'No connection';
  if (status === 403) return 'Not allowed for your role';
  if (status === 404) return 'Not found';
  if (status === 409) return 'Changed elsewhere';
  // 422: the request was understood but the record is not ready for it (nothing to send, a date passed).
  if (status === 422) return 'Not possible yet';
  if (status >= 400 && status < 500) return 'Check the form';
  return 'Server problem';
}
