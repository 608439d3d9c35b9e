import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type PasswordResetConfirmInput = { token: string; password: string };

export async function confirmPasswordReset(input: PasswordResetConfirmInput): Promise<void> {
  await apiClient.post('/auth/password-reset/confirm', input, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
