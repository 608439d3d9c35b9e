import type { FitReport } from '@swapwright/shared';
import { draftLinesFromReport } from './quote-draft.builder';

describe('the quote drafted from a fit report', () => {
  it('a part remedy without a catalog part is quoted by its first sentence, not cut off mid-word', () => {
    // Common practice (no published source): a quote line names what to buy; the reasons stay in the fit report.
    const note =
      'No candidate pan for a center sump with a pump-bolted pickup keeps every clearance below the engine at this placement. ' +
      'Left out at this placement: Kestrel centre-sump tow pan runs 53.8 mm (2.12 in) into the front crossmember.';
    const report = {
      shortfalls: [{ checkId: 'oiling.pan-pickup-pump', remedies: [{ kind: 'part', category: 'oil-pan', requires: {}, partIds: [], note }] }],
    } as unknown as FitReport;
    const lines = draftLinesFromReport({ report, operations: [], catalogRow: () => null, baseOperationCodes: [], defaultMarkupPercent: 0 });
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({
      kind: 'part',
      source: 'fit-remedy',
      description: 'No candidate pan for a center sump with a pump-bolted pickup keeps every clearance below the engine at this placement.',
      catalogItemId: null,
    });
  });
});
