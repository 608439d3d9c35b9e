import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { RequestBodyOf, Schemas } from '@/lib/api-types';

export type SignUpInput = RequestBodyOf<'/api/auth/sign-up', 'post'>;
/** The route answers 202 Accepted (the shop is created from the e-mailed link). */
export type SignUpAccepted = Schemas['SignUpAcceptedResponseDto'];

/** Always answers alike (a registered address is not revealed): the shop is created from the e-mailed link. */
export async function signUp(input: SignUpInput): Promise<SignUpAccepted> {
  const { data } = await apiClient.post<SignUpAccepted>('/auth/sign-up', input, {
    skipAuthRefresh: true,
    skipErrorNotification: true,
  });
  return data;
}

export function useSignUp() {
  return useSingleFlightMutation({ mutationFn: signUp });
}
