import type { Quote } from './quote.entity';

/** A quote's number as the shop and the customer read it: `Q-0042`. */
export function quoteLabel(quote: Pick<Quote, 'number'>): string {
  return `Q-${String(quote.number).padStart(4, '0')}`;
}
