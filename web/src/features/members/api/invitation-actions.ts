import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Invitation } from '../types';
import { memberKeys } from './member-keys';

/** A new link, valid 7 days, e-mailed again; the old link stops working. */
export async function resendInvitation(id: string): Promise<Invitation> {
  const { data } = await apiClient.post<Invitation>(`/invitations/${encodeURIComponent(id)}/resend`);
  return data;
}

/** Withdraws an invitation not accepted yet: its link stops working. */
export async function withdrawInvitation(id: string): Promise<void> {
  await apiClient.delete(`/invitations/${encodeURIComponent(id)}`);
}

export function useResendInvitation({ onSuccess }: { onSuccess?: (invitation: Invitation) => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: resendInvitation,
    onSuccess: (invitation) => onSuccess?.(invitation),
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.invitations() }),
  });
}

export function useWithdrawInvitation({ onSuccess }: { onSuccess?: () => void } = {}) {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: withdrawInvitation,
    onSuccess: () => onSuccess?.(),
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.invitations() }),
  });
}
