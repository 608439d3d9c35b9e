const ACCESS_KEY = 'swapwright.accessToken';
const REFRESH_KEY = 'swapwright.refreshToken';

export type StoredTokens = { accessToken: string; refreshToken: string };

function safeStorage(): Storage | null {
  try {
    return typeof window === 'undefined' ? null : window.localStorage;
  } catch {
    return null;
  }
}

export const tokenStorage = {
  getAccessToken(): string | null {
    return safeStorage()?.getItem(ACCESS_KEY) ?? null;
  },
  getRefreshToken(): string | null {
    return safeStorage()?.getItem(REFRESH_KEY) ?? null;
  },
  hasSession(): boolean {
    return Boolean(this.getAccessToken() || this.getRefreshToken());
  },
  set(tokens: StoredTokens): void {
    const storage = safeStorage();
    storage?.setItem(ACCESS_KEY, tokens.accessToken);
    storage?.setItem(REFRESH_KEY, tokens.refreshToken);
  },
  clear(): void {
    const storage = safeStorage();
    storage?.removeItem(ACCESS_KEY);
    storage?.removeItem(REFRESH_KEY);
  },
};
