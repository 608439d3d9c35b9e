import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';

export type PasswordResetRequestInput = RequestBodyOf<'/api/auth/password-reset/request', 'post'>;

export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  await apiClient.post('/auth/password-reset/request', input, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useRequestPasswordReset() {
  return useSingleFlightMutation({ mutationFn: requestPasswordReset });
}
