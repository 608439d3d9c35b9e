import type { RequestBodyOf, Schemas } from '@/lib/api-types';

export type Quote = Schemas['QuoteResponseDto'];
export type QuoteStatus = Quote['status'];
export type QuoteLine = Schemas['QuoteLineResponseDto'];
export type QuoteLineInput = NonNullable<RequestBodyOf<'/api/quotes/{id}', 'patch'>['lines']>[number];
export type QuoteRevisionDiff = Schemas['QuoteRevisionDiffResponseDto'];
export type LaborOperation = Schemas['LaborOperationResponseDto'];
export type DepositPayment = Schemas['DepositPaymentResponseDto'];
export type QuoteSettings = Schemas['QuoteSettingsResponseDto'];
export type OwnBuild = Schemas['OwnBuildResponseDto'];
