import { changedFigures } from './changed-figures';

describe('changedFigures', () => {
  it('keeps only the named fields whose value moves, decimals read from strings as the driver returns them', () => {
    const shop = { laborRatePerHour: '135.00', taxRatePercent: '8.25', name: 'A' };
    const moved = changedFigures(shop, { laborRatePerHour: 142.5, taxRatePercent: 8.25 }, ['laborRatePerHour', 'taxRatePercent']);
    expect(moved).toEqual({ before: { laborRatePerHour: 135 }, after: { laborRatePerHour: 142.5 }, description: 'laborRatePerHour 135 → 142.5' });
  });

  it('treats null as no figure and reports nothing when nothing moves', () => {
    expect(changedFigures({ suppliesCapCents: null }, { suppliesCapCents: 5000 }, ['suppliesCapCents'])?.description).toBe('suppliesCapCents none → 5000');
    expect(changedFigures({ depositPercent: 30 }, { depositPercent: 30 }, ['depositPercent'])).toBeNull();
    expect(changedFigures({ depositPercent: 30 }, {}, ['depositPercent'])).toBeNull();
  });
});
