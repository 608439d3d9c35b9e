import { describe, expect, it } from 'vitest';
import { changeWords } from '../audit-change-words';

describe('the audit log in words', () => {
  it('writes a sent quote with its status in the quote tag words and money in the one money style', () => {
    // Source: Unicode CLDR "en" currency pattern ¤#,##0.00 (ECMA-402 Intl.NumberFormat, style currency).
    expect(changeWords('quote.sent', { status: 'awaiting-answer', sentRevision: 1 })).toBe('Status: Awaiting the customer, Revision sent: 1');
    expect(changeWords('quote.sent', { status: 'awaiting-answer', sentRevision: 2, totalCents: 499616, depositCents: 149885 })).toBe(
      'Status: Awaiting the customer, Revision sent: 2, Total: $4,996.16, Deposit: $1,498.85',
    );
    expect(changeWords('quote.sent', { status: 'drafting', sentRevision: null })).toBe('Status: Being written, Revision sent: —');
  });

  it('writes stock states in the counter words', () => {
    expect(changeWords('stock.reserved', { status: 'open', location: 'Main store', onHand: 3, reserved: 2 })).toBe(
      'Status: Not set aside, Location: Main store, On hand: 3, Set aside: 2',
    );
    expect(changeWords('stock.received', { status: 'received' })).toBe('Status: Arrived, set aside');
  });

  it("writes a settled deposit in its own currency and leaves the provider's event id out", () => {
    const words = changeWords('payment.settled', { state: 'paid', amountCents: 153957, currency: 'USD', eventId: 'evt_e9d65daeb5cfd8df4c861527' });
    expect(words).toBe('State: Paid, Amount: $1,539.57');
    expect(changeWords('payment.settled', { state: 'pending' })).toBe('State: Waiting for payment');
  });

  it('gives any other field and code readable words, and nothing recorded as a dash', () => {
    expect(changeWords('shop.rates-changed', { laborRatePerHour: 135, taxRatePercent: 8.25 })).toBe('Labor rate: $135.00 per hour, Tax on parts: 8.25 %');
    expect(changeWords('quote-terms.changed', { suppliesCapCents: null, depositPercent: 30 })).toBe('Shop supplies cap: —, Deposit share: 30 %');
    expect(changeWords('job.retried', { state: 'queued', attempts: 0 })).toBe('State: Waiting, Attempts: 0');
    expect(changeWords('quote.sent', null)).toBe('—');
    expect(changeWords('job.retried', { lastErrorCode: 'SMTP_DOWN' })).toBe('Last error code: SMTP_DOWN');
    expect(changeWords('payment.settled', { eventId: 'evt_1' })).toBe('—');
  });

  it('writes lists and nested records as words, never as [object Object]', () => {
    expect(changeWords('counter.matched-to-quote', { lines: ['SW-90 ×1 (Not set aside)', 'PK-12 ×2 (Ordered)'] })).toBe('Lines: SW-90 ×1 (Not set aside); PK-12 ×2 (Ordered)');
    expect(changeWords('counter.matched-to-quote', { lines: [{ sku: 'SW-90', quantity: 1, status: 'open' }], changes: [] })).toBe(
      'Lines: (Sku: SW-90, Quantity: 1, Status: Not set aside), Changes: none',
    );
  });
});
