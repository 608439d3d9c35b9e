import { CATALOG_KIND_NAMES, CRANK_SIGNALS, SUMP_POSITIONS, isOneOf } from './value-lists';

describe('value lists', () => {
  // Common practice (no published source): a closed list holds each value once.
  it.each([CATALOG_KIND_NAMES, CRANK_SIGNALS, SUMP_POSITIONS])('holds each value once', (...list) => {
    expect(new Set(list).size).toBe(list.length);
  });

  // Common practice (no published source): a value outside the list is refused, case and type included.
  it('narrows only members of the list', () => {
    expect(isOneOf(SUMP_POSITIONS, 'rear')).toBe(true);
    expect(isOneOf(SUMP_POSITIONS, 'Rear')).toBe(false);
    expect(isOneOf(SUMP_POSITIONS, 3)).toBe(false);
  });
});
