/** The payment provider's event types in the app's words. */
const PAYMENT_EVENT_WORDS: Record<string, string> = {
  'payment_intent.succeeded': 'Deposit payment settled',
  'payment_intent.payment_failed': 'Deposit payment failed',
  'payment_intent.canceled': 'Deposit payment cancelled',
  'payment_intent.processing': 'Deposit payment in progress',
};

/** "Deposit payment for quote Q-0003: payment_intent.succeeded (evt_…)" as stored for a provider event's job. */
const PAYMENT_EVENT_SUBJECT = /^(?:Deposit payment for (quote \S+)|Payment provider event): ([a-z_]+\.[a-z_]+) \(([A-Za-z0-9_]+)\)$/;

/**
 * A job's subject as the owner reads it: a payment provider's event in words ("Deposit payment settled for quote
 * Q-0003") with the provider's own reference apart, for the small print; any other subject as it is.
 */
export function jobSubjectWords(subject: string): { text: string; reference?: string } {
  const match = PAYMENT_EVENT_SUBJECT.exec(subject);
  if (!match) return { text: subject };
  const [, quote, type, reference] = match;
  const what = PAYMENT_EVENT_WORDS[type] ?? 'Payment provider event';
  return { text: quote ? `${what} for ${quote}` : what, reference };
}
