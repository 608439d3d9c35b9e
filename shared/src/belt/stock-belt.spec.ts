import { beltLengthWindow, formatBeltDesignation, nearestStockBelt, parseBeltDesignation, ribbedBeltWidthMm } from './stock-belt';

describe('stock belt choice', () => {
  const takeUp = { shorterMm: 10, longerMm: 15 };

  it('takes the stock length nearest the computed one inside the take-up', () => {
    // Derived: window 1213.4–1238.4 mm around 1223.4 mm.
    const choice = nearestStockBelt(1223.3626, takeUp, [1200, 1250, 1225, 1215]);
    expect(choice).toMatchObject({ lengthMm: 1225, withinTakeUp: true });
    expect(choice?.differenceMm).toBeCloseTo(1.6374, 4);
    expect(choice?.marginMm).toBeCloseTo(11.6374, 4);
  });

  it('prefers nearest, not the one with most room', () => {
    const choice = nearestStockBelt(1000, takeUp, [1003, 1010]);
    expect(choice?.lengthMm).toBe(1003);
  });

  it('reports the nearest outside the window with a negative margin', () => {
    const choice = nearestStockBelt(1223.3626, takeUp, [1150, 1245]);
    expect(choice).toMatchObject({ lengthMm: 1245, withinTakeUp: false });
    expect(choice?.marginMm).toBeCloseTo(-6.6374, 4);
  });

  it('returns null with no stock lengths', () => {
    expect(nearestStockBelt(1000, takeUp, [])).toBeNull();
    expect(beltLengthWindow(1000, takeUp)).toEqual({ minMm: 990, maxMm: 1015 });
  });
});

describe('belt designation', () => {
  it('ribs × PK × effective length', () => {
    // Source: ISO 9982:2019, PK belts designated ribs × profile × effective length, e.g. 6PK2120.
    expect(formatBeltDesignation(6, 2120)).toBe('6PK2120');
    expect(formatBeltDesignation(6, 1223.3626)).toBe('6PK1223');
    expect(parseBeltDesignation('6PK2120')).toEqual({ ribs: 6, profile: 'PK', effectiveLengthMm: 2120 });
    expect(parseBeltDesignation(' 8pk 1225 ')).toEqual({ ribs: 8, profile: 'PK', effectiveLengthMm: 1225 });
  });

  it('refuses nonsense', () => {
    expect(() => parseBeltDesignation('6PJ1225')).toThrow(RangeError);
    expect(() => parseBeltDesignation('0PK1225')).toThrow(RangeError);
    expect(() => formatBeltDesignation(6.5, 1200)).toThrow(RangeError);
    expect(() => formatBeltDesignation(6, 0)).toThrow(RangeError);
  });

  it('width from the PK rib pitch', () => {
    // Source: ISO 9982:2019, PK rib pitch 3.56 mm.
    expect(ribbedBeltWidthMm(6)).toBeCloseTo(21.36, 12);
  });
});
