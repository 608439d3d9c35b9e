import type { FitReport } from '@swapwright/shared';
import type { LaborOperation } from '../labor-operations/labor-operation.entity';
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

  it('the transmission crossmember asked to move back and down by two shortfalls is one labor line of the shop operation', () => {
    // Common practice (no published source): a shop reworks the transmission crossmember once, in one set-up.
    const fabrication = (operation: string) => ({ kind: 'fabrication', operation, laborHours: 4, operationCode: 'transmission-crossmember', note: '' });
    const report = {
      shortfalls: [
        { checkId: 'drivetrain.transmission-mount-position', remedies: [fabrication('Relocate the transmission crossmember 72.3 mm (2.85 in) rearward')] },
        { checkId: 'drivetrain.transmission-mount-height', remedies: [fabrication('Drop the transmission crossmember 8.7 mm (0.34 in), or fit a drop crossmember')] },
      ],
    } as unknown as FitReport;
    const operations = [{ id: 'op-xm', code: 'transmission-crossmember', name: 'Transmission crossmember', bookHours: 4, buildOrder: 30 }] as unknown as LaborOperation[];
    const lines = draftLinesFromReport({ report, operations, catalogRow: () => null, baseOperationCodes: [], defaultMarkupPercent: 0 });
    expect(lines).toEqual([
      expect.objectContaining({
        kind: 'labor',
        source: 'fit-remedy',
        description: 'Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it 8.7 mm (0.34 in), or fit a drop crossmember',
        laborOperationId: 'op-xm',
        hours: 4,
      }),
    ]);
  });
});
