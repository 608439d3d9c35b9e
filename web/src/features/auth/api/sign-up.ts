import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { Session } from '@/types/api';
import { useStoreSession } from '../hooks/use-store-session';

export type SignUpInput = { email: string; password: string; name: string; shopName: string };

export async function signUp(input: SignUpInput): Promise<Session> {
  const { data } = await apiClient.post<Session>('/auth/sign-up', input, {
    skipAuthRefresh: true,
    skipErrorNotification: true,
  });
  return data;
}

export function useSignUp({ onSuccess }: { onSuccess?: (session: Session) => void } = {}) {
  const storeSession = useStoreSession();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (session) => {
      storeSession(session);
      onSuccess?.(session);
    },
  });
}
