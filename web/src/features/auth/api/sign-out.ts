import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import { tokenStorage } from '@/lib/token-storage';

export async function signOut(refreshToken: string): Promise<void> {
  await apiClient.post('/auth/sign-out', { refreshToken }, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useSignOut({ onSettled }: { onSettled?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
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
