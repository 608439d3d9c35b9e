import { AppError } from '../common/errors/app-error';

export const PaymentErrors = {
  notConfigured: () => new AppError(503, 'payments_not_configured', 'Online payment is not set up for this shop yet; pay the deposit at the shop.'),
  notDue: (why: string) => new AppError(409, 'deposit_not_due', why),
  declined: (message: string) =>
    new AppError(402, 'card_declined', `${message} Nothing was charged; the quote stays approved. Try another card, or pay at the shop.`),
  providerUnavailable: () => new AppError(502, 'payment_provider_unavailable', 'The payment service did not answer. Nothing was charged; try again in a minute.'),
  badSignature: () => new AppError(400, 'webhook_signature_invalid', 'The event signature does not verify.'),
};
