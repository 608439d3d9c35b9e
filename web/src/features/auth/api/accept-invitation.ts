import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf, Session } from '@/lib/api-types';
import { useStoreSession } from '../hooks/use-store-session';

export type AcceptInvitationInput = RequestBodyOf<'/api/invitations/accept', 'post'>;

export async function acceptInvitation(input: AcceptInvitationInput): Promise<Session> {
  const { data } = await apiClient.post<Session>('/invitations/accept', input, {
    skipAuthRefresh: true,
    skipErrorNotification: true,
  });
  return data;
}

export function useAcceptInvitation({ onSuccess }: { onSuccess?: (session: Session) => void } = {}) {
  const storeSession = useStoreSession();
  return useSingleFlightMutation({
    mutationFn: acceptInvitation,
    onSuccess: (session) => {
      storeSession(session);
      onSuccess?.(session);
    },
  });
}
