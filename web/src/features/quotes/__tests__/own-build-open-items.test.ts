import { describe, expect, it } from 'vitest';
import { LINES, quoteStub } from '../components/__tests__/quote-stub';
import { laborHours, ownBuildOpenItems, ownTimeLaborSentence } from '../own-build-open-items';

// A new owner-builder's budget: no labor rate yet, two part lines the plan could not price.
const budget = quoteStub({
  laborRateCents: 0,
  lines: [
    { ...LINES[0], unitPriceCents: 0, lineTotalCents: 0 },
    { ...LINES[1], pricing: 'list', unitCostCents: null, markupPercent: null, unitPriceCents: 0, lineTotalCents: 0 },
    { ...LINES[2], hours: 9.2, unitPriceCents: 0, lineTotalCents: 0 },
    { ...LINES[3], hours: 9.3, unitPriceCents: 0, lineTotalCents: 0 },
  ],
});
const NEEDS = ['Oil pan', 'Motor mounts', 'Exhaust', 'Cooling', 'Fuel supply', 'Driveshaft'].map((title) => ({ title }));

describe('what is still open on a builder’s budget before it is frozen', () => {
  it('counts labor at $0 per hour as the builder’s own time, a note and not an open item', () => {
    // Hand-added: 9.2 h + 9.3 h = 18.5 h.
    expect(laborHours(budget.revision)).toBe(18.5);
    expect(ownTimeLaborSentence(budget.revision)).toBe('Labor is counted at $0 per hour: 18.5 h of your own time.');
    expect(ownTimeLaborSentence(quoteStub().revision)).toBeNull();
    const [labor] = ownBuildOpenItems({ quote: budget });
    expect(labor).toMatchObject({ key: 'labor-rate', open: false, link: { to: '/settings/shop' } });
    expect(labor.link.label).toMatch(/budget paid help/);
  });

  it('lists each open fact of the tryout budget as a sentence with the page where it is fixed', () => {
    const items = ownBuildOpenItems({
      quote: budget,
      fitReport: { counts: { unknown: 11, fails: 1 } },
      partsPlan: { result: { unresolved: NEEDS } },
      sheet: { values: [], missing: ['ride-height-front', 'rail-bottom'] },
    });
    expect(items.map((item) => [item.key, item.sentence, item.link.to])).toEqual([
      ['labor-rate', 'Labor is counted at $0 per hour: 18.5 h of your own time.', '/settings/shop'],
      ['zero-priced-parts', '2 part lines are priced at $0.00: Rear-sump oil pan and Pickup tube and screen.', '/quotes/quote-7'],
      ['unmatched-needs', 'The parts plan could not match parts for 6 needs: Oil pan, Motor mounts, Exhaust and 3 more.', '/projects/project-1'],
      ['fit-unchecked', '11 fit checks could not run: they need measurements or other input.', '/projects/project-1/fit'],
      ['fit-fails', '1 fit check still does not fit.', '/projects/project-1/fit'],
      ['not-measured', 'The chassis has not been measured: the fit rests on catalog figures only.', '/projects/project-1/measurements'],
    ]);
    expect(items.filter((item) => item.open)).toHaveLength(5);
  });

  it('names long part lines shortly, without their closing full stop', () => {
    const long = { ...LINES[0], description: 'A radiator with its inlet and outlet on the engine’s sides.', unitPriceCents: 0, lineTotalCents: 0 };
    const short = { ...LINES[0], description: 'An electronic pedal assembly.', unitPriceCents: 0, lineTotalCents: 0 };
    const [, parts] = ownBuildOpenItems({ quote: quoteStub({ laborRateCents: 0, lines: [long, short] }) });
    expect(parts.sentence).toBe('2 part lines are priced at $0.00: A radiator with its inlet and outlet on… and An electronic pedal assembly.');
  });

  it('says when no fit check was run, and counts the required measurements still missing', () => {
    const items = ownBuildOpenItems({ quote: quoteStub(), fitReport: null, partsPlan: null, sheet: { values: [{}], missing: ['rail-bottom'] } });
    expect(items.map((item) => item.sentence)).toEqual(['No fit check has been run on this truck yet.', '1 required chassis measurement is still missing.']);
  });

  it('has nothing to list for a priced, checked, measured budget, nor for facts it could not read', () => {
    expect(ownBuildOpenItems({ quote: quoteStub(), fitReport: { counts: { unknown: 0, fails: 0 } }, partsPlan: { result: { unresolved: [] } }, sheet: { values: [{}], missing: [] } })).toEqual([]);
    expect(ownBuildOpenItems({ quote: quoteStub() })).toEqual([]);
  });
});
