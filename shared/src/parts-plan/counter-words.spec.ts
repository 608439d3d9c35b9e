import { COUNTER_STATUSES } from '../types/value-lists';
import { COUNTER_STATUS_LABELS, counterLineShortBy, counterLineStateWords } from './counter-words';

describe('counter line words', () => {
  it('gives every counter state plain words, none of them the stored code', () => {
    for (const status of COUNTER_STATUSES) {
      expect(COUNTER_STATUS_LABELS[status]).toMatch(/^[A-Z][a-z ,]+$/);
      expect(counterLineStateWords({ status, quantity: 1, available: 1 })).toBe(COUNTER_STATUS_LABELS[status]);
    }
    expect(counterLineStateWords({ status: 'to-order', quantity: 2, available: 0 })).toBe('To order');
  });

  // Common practice (no published source): a line not yet set aside that the shelf cannot cover is ordered, not reserved.
  it('reads an open line the shelf cannot cover as short by the missing units', () => {
    expect(counterLineShortBy({ status: 'open', quantity: 3, available: 1 })).toBe(2);
    expect(counterLineStateWords({ status: 'open', quantity: 3, available: 1 })).toBe('Short by 2');
    // Stock held by other lines beyond what is on hand counts as none free, not as more missing.
    expect(counterLineStateWords({ status: 'open', quantity: 2, available: -1 })).toBe('Short by 2');
    expect(counterLineShortBy({ status: 'reserved', quantity: 3, available: 0 })).toBe(0);
    expect(counterLineStateWords({ status: 'open', quantity: 2, available: 2 })).toBe('Not set aside');
  });

  it('shows an unknown code as it is rather than nothing', () => {
    expect(counterLineStateWords({ status: 'lost', quantity: 1, available: 1 })).toBe('lost');
  });
});
