import { useQueryClient } from '@tanstack/react-query';
import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { Membership, MembershipChanges } from '../types';
import { memberKeys } from './member-keys';

export type UpdateMembershipInput = { id: string } & MembershipChanges;

export async function updateMembership({ id, role }: UpdateMembershipInput): Promise<Membership> {
  const { data } = await apiClient.patch<Membership>(`/memberships/${encodeURIComponent(id)}`, { role });
  return data;
}

export function useUpdateMembership() {
  const queryClient = useQueryClient();
  return useSingleFlightMutation({
    mutationFn: updateMembership,
    onSettled: () => queryClient.invalidateQueries({ queryKey: memberKeys.memberships() }),
  });
}
