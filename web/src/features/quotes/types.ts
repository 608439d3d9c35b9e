import type { Schemas } from '@/lib/api-types';

export type Quote = Schemas['QuoteResponseDto'];
export type QuoteStatus = Quote['status'];
export type DepositPayment = Schemas['DepositPaymentResponseDto'];
