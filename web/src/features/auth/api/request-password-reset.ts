import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';

export type PasswordResetRequestInput = { email: string };

export async function requestPasswordReset(input: PasswordResetRequestInput): Promise<void> {
  await apiClient.post('/auth/password-reset/request', input, { skipAuthRefresh: true, skipErrorNotification: true });
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
