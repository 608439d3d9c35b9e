import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf, Session } from '@/lib/api-types';
import { useStoreSession } from '../hooks/use-store-session';

/** Opens the e-mailed sign-up link: creates the shop and signs its owner in. */
export async function confirmSignUp(token: string): Promise<Session> {
  const body: RequestBodyOf<'/api/auth/sign-up/confirm', 'post'> = { token };
  const { data } = await apiClient.post<Session>('/auth/sign-up/confirm', body, { skipAuthRefresh: true, skipErrorNotification: true });
  return data;
}

export function useConfirmSignUp({ onSuccess }: { onSuccess?: (session: Session) => void } = {}) {
  const storeSession = useStoreSession();
  return useSingleFlightMutation({
    mutationFn: confirmSignUp,
    onSuccess: (session) => {
      storeSession(session);
      onSuccess?.(session);
    },
  });
}
