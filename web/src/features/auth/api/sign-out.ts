import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';
import { tokenStorage } from '@/lib/token-storage';

export async function signOut(refreshToken: string): Promise<void> {
  const body: RequestBodyOf<'/api/auth/sign-out', 'post'> = { refreshToken };
  await apiClient.post('/auth/sign-out', body, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useSignOut({ onSettled }: { onSettled?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: async () => {
      const refreshToken = tokenStorage.getRefreshToken();
      tokenStorage.clear();
      // Sign-out on the server is best effort; the local session ends either way.
      if (refreshToken) await signOut(refreshToken).catch(() => undefined);
    },
    onSettled: () => {
      queryClient.clear();
      onSettled?.();
    },
  });
}
