import { COUNTER_STATUSES } from '../types/value-lists';
import { COUNTER_STATUS_LABELS, counterLineSetAside, counterLineShortBy, counterLineStateWords, counterReadiness } from './counter-words';

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

  // Common practice (no published source): parts set aside for a job stay on the shelf until issued to it; once issued
  // they are off the shelf, so nothing is short and nothing is set aside any more.
  it('an issued line reads issued to the job, is not set aside and is never short', () => {
    expect(counterLineStateWords({ status: 'issued', quantity: 2, available: 0 })).toBe('Issued to the job');
    expect(counterLineShortBy({ status: 'issued', quantity: 2, available: 0 })).toBe(0);
    expect(counterLineSetAside({ status: 'issued' })).toBe(false);
    expect(counterLineSetAside({ status: 'reserved' })).toBe(true);
    expect(counterLineSetAside({ status: 'received' })).toBe(true);
    expect(counterLineSetAside({ status: 'open' })).toBe(false);
  });

  it('shows an unknown code as it is rather than nothing', () => {
    expect(counterLineStateWords({ status: 'lost', quantity: 1, available: 1 })).toBe('lost');
  });
});

describe('counterReadiness', () => {
  it('counts the lines on the shelf or issued as with the job, and lists the others as waiting', () => {
    const lines = [
      { sku: 'A', status: 'reserved' },
      { sku: 'B', status: 'open' },
      { sku: 'C', status: 'received' },
      { sku: 'D', status: 'ordered' },
      { sku: 'E', status: 'issued' },
      { sku: 'F', status: 'to-order' },
    ];
    const readiness = counterReadiness(lines);
    expect(readiness).toMatchObject({ total: 6, withTheJob: 3 });
    expect(readiness.waiting.map((line) => line.sku)).toEqual(['B', 'D', 'F']);
    expect(counterReadiness([])).toEqual({ total: 0, withTheJob: 0, waiting: [] });
  });
});
