import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { DepositPayment } from '../types';

export async function payDepositByLink(token: string, paymentMethod: string): Promise<DepositPayment> {
  const { data } = await apiClient.post<DepositPayment>(
    `/quote-links/${encodeURIComponent(token)}/deposit`,
    { paymentMethod },
    { skipAuthRefresh: true, skipErrorNotification: true },
  );
  return data;
}

export function usePayDepositByLink(token: string) {
  return useSingleFlightMutation({ mutationFn: (paymentMethod: string) => payDepositByLink(token, paymentMethod) });
}
