import { useMutation } from '@tanstack/react-query';
import { apiClient } from '@/lib/api-client';
import type { components } from '@/lib/api-schema';

export type SignUpInput = components['schemas']['SignUpDto'];
export type SignUpAccepted = components['schemas']['SignUpAcceptedResponseDto'];

/** Always answers alike (a registered address is not revealed): the shop is created from the e-mailed link. */
export async function signUp(input: SignUpInput): Promise<SignUpAccepted> {
  const { data } = await apiClient.post<SignUpAccepted>('/auth/sign-up', input, {
    skipAuthRefresh: true,
    skipErrorNotification: true,
  });
  return data;
}

export function useSignUp() {
  return useMutation({ mutationFn: signUp });
}
