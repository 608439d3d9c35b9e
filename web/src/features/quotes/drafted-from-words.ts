import type { Quote } from './types';

/** What a new quote was drafted from, said as it is: the parts plan, the fit report, both, or neither (an empty draft). */
export function draftedFromWords(quote: Pick<Quote, 'label' | 'forMyself'> & { revision: Pick<Quote['revision'], 'partsPlanVersion' | 'fitReportId'> }): string {
  const noun = `${quote.forMyself ? 'Budget' : 'Quote'} ${quote.label}`;
  const { partsPlanVersion, fitReportId } = quote.revision;
  if (partsPlanVersion !== null && fitReportId) return `${noun} drafted from parts plan version ${partsPlanVersion} and the fit report`;
  if (partsPlanVersion !== null) return `${noun} drafted from parts plan version ${partsPlanVersion}`;
  if (fitReportId) return `${noun} drafted from the fit report, without parts: build a parts plan to draft its parts and prices`;
  return `${noun} started with no lines from a plan: add its lines, or build a parts plan first and draft from it`;
}
