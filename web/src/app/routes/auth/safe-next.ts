import { paths } from '@/config/paths';

/** Only same-app paths, so a crafted link cannot send people elsewhere after sign-in. */
export function safeNext(raw: string | null): string {
  return raw && raw.startsWith('/') && !raw.startsWith('//') ? raw : paths.home;
}
