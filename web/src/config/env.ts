export type AppEnv = {
  apiUrl: string;
  mode: string;
};

function readApiUrl(raw: string | undefined): string {
  const value = (raw ?? '/api').trim().replace(/\/+$/, '');
  if (!/^(\/|https?:\/\/)/.test(value)) {
    // Fail at start-up instead of sending every request to a wrong relative path.
    throw new Error(`VITE_API_URL must start with "/" or "http(s)://", got "${raw}"`);
  }
  return value;
}

export const env: AppEnv = {
  apiUrl: readApiUrl(import.meta.env.VITE_API_URL),
  mode: import.meta.env.MODE,
};
