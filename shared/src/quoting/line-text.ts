import type { TextPartsOptions } from '../units/unit-format';

/** What a quote line's stored words are, as far as unit conversion goes. */
export interface QuoteLineWords {
  kind: 'part' | 'labor';
  /** Where the line came from: `fit-remedy` lines are drafted from the fit check's own sentences. */
  source?: string;
  /** The catalog part the line names, if any. */
  catalogItemId?: string | null;
}

/**
 * How a quote line's figures are shown in the reader's units. A part line naming a part keeps its lone figures: they
 * belong to the name as its maker prints it ("255 L/h in-tank pump"), which the customer, the counter and the supplier
 * must read alike; only the engine's paired lengths ("90.0 mm (3.54 in)") follow the reader. A part line that the fit
 * check wrote for want of a catalog part ("a pump that delivers at least 138.1 L/h") is the engine's own sentence, so
 * every figure in it follows the reader, as in the fit report. Labor lines are the engine's or the shop's words.
 */
export function quoteLineTextOptions(line: QuoteLineWords): TextPartsOptions {
  const engineSentence = line.source === 'fit-remedy' && !line.catalogItemId;
  return { pairedLengthsOnly: line.kind === 'part' && !engineSentence };
}
