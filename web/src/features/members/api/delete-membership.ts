import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import { memberKeys } from './member-keys';

export async function deleteMembership(id: string): Promise<void> {
  await apiClient.delete(`/memberships/${encodeURIComponent(id)}`);
}

export function useDeleteMembership() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: deleteMembership,
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.memberships() }),
  });
}
