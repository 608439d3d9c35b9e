import { changedFigures } from './changed-figures';

describe('changedFigures', () => {
  it('keeps only the named fields whose value moves, decimals read from strings as the driver returns them', () => {
    const shop = { laborRatePerHour: '135.00', taxRatePercent: '8.25', name: 'A' };
    const moved = changedFigures(shop, { laborRatePerHour: 142.5, taxRatePercent: 8.25 }, ['laborRatePerHour', 'taxRatePercent']);
    expect(moved).toEqual({ before: { laborRatePerHour: 135 }, after: { laborRatePerHour: 142.5 }, description: 'labor rate $135.00 per hour → $142.50 per hour' });
  });

  it('names each figure in words, money in the shop currency and shares as percents', () => {
    // Source: Unicode CLDR, locale "en": the Canadian dollar's symbol outside Canada is CA$ (ECMA-402 Intl.NumberFormat, currencyDisplay "symbol").
    const moved = changedFigures(
      { taxRatePercent: 8, suppliesCapCents: 2500, defaultMarkupPercent: 30 },
      { taxRatePercent: 8.25, suppliesCapCents: 5000, defaultMarkupPercent: 35 },
      ['taxRatePercent', 'suppliesCapCents', 'defaultMarkupPercent'],
      'CAD',
    );
    expect(moved?.description).toBe('tax on parts 8 % → 8.25 %, shop supplies cap CA$25.00 → CA$50.00, default markup 30 % → 35 %');
  });

  it('treats null as no figure and reports nothing when nothing moves', () => {
    expect(changedFigures({ suppliesCapCents: null }, { suppliesCapCents: 5000 }, ['suppliesCapCents'])?.description).toBe('shop supplies cap none → $50.00');
    expect(changedFigures({ depositPercent: 30 }, { depositPercent: 30 }, ['depositPercent'])).toBeNull();
    expect(changedFigures({ depositPercent: 30 }, {}, ['depositPercent'])).toBeNull();
  });
});
