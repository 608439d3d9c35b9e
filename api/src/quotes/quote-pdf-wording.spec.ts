import { resolvedByLine } from './quote-pdf.service';

describe('the quote PDF: remedies under a shortfall', () => {
  it('reads as one sentence, each remedy without its own full stop before the separator', () => {
    // Common practice (no published source): a run-in list of clauses is separated by semicolons and ends with one full stop.
    expect(resolvedByLine(['A rear-sump pan that bolts to this engine clears the crossmember.', 'Notch the crossmember (3.5 h)'])).toBe(
      'Resolved by: A rear-sump pan that bolts to this engine clears the crossmember; Notch the crossmember (3.5 h).',
    );
    expect(resolvedByLine(['Raise the engine 12 mm. '])).toBe('Resolved by: Raise the engine 12 mm.');
  });
});
