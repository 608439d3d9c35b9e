import { useSingleFlightMutation } from '@/hooks/use-single-flight-mutation';
import { apiClient } from '@/lib/api-client';
import type { DepositPayment } from '../types';

/** The signed-in customer pays the deposit of their approved quote; the provider's webhook marks it paid. */
export async function payDeposit(quoteId: string, paymentMethod: string): Promise<DepositPayment> {
  const { data } = await apiClient.post<DepositPayment>(`/quotes/${encodeURIComponent(quoteId)}/deposit`, { paymentMethod }, { skipErrorNotification: true });
  return data;
}

export function usePayDeposit(quoteId: string) {
  return useSingleFlightMutation({ mutationFn: (paymentMethod: string) => payDeposit(quoteId, paymentMethod) });
}
