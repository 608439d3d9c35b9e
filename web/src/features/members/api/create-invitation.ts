import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { CreateInvitationInput, Invitation } from '../types';
import { memberKeys } from './member-keys';

export async function createInvitation(input: CreateInvitationInput): Promise<Invitation> {
  const { data } = await apiClient.post<Invitation>('/invitations', input, { skipErrorNotification: true });
  return data;
}

export function useCreateInvitation({ onSuccess }: { onSuccess?: (invitation: Invitation) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: createInvitation,
    onSuccess: (invitation) => {
      void queryClient.invalidateQueries({ queryKey: memberKeys.invitations() });
      onSuccess?.(invitation);
    },
  });
}
