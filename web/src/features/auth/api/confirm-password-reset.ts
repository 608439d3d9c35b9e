import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf } from '@/lib/api-types';

export type PasswordResetConfirmInput = RequestBodyOf<'/api/auth/password-reset/confirm', 'post'>;

export async function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<void> {
  await apiClient.post('/auth/password-reset/confirm', input, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useConfirmPasswordReset() {
  return useSingleFlightMutation({ mutationFn: confirmPasswordReset });
}
