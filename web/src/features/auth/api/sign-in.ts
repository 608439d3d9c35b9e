import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf, Session } from '@/lib/api-types';
import { useStoreSession } from '../hooks/use-store-session';

export type SignInInput = RequestBodyOf<'/api/auth/sign-in', 'post'>;

export async function signIn(input: SignInInput): Promise<Session> {
  const { data } = await apiClient.post<Session>('/auth/sign-in', input, {
    skipAuthRefresh: true,
    skipErrorNotification: true,
  });
  return data;
}

export type UseSignInOptions = { onSuccess?: (session: Session) => void };

export function useSignIn({ onSuccess }: UseSignInOptions = {}) {
  const storeSession = useStoreSession();
  return useSingleFlightMutation({
    mutationFn: signIn,
    onSuccess: (session) => {
      storeSession(session);
      onSuccess?.(session);
    },
  });
}
