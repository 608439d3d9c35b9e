import { quoteLineTextOptions, renderText, textParts, type QuoteLineWords } from '@swapwright/shared';
import { useUnits } from '@/hooks/use-units';

export interface LineDescriptionProps {
  /**
   * The line's kind and stored words. A labor line drawn from the parts plan carries the engine's figures
   * ("8.7 mm (0.34 in)"); a part line carries the part's name as its maker prints it ("Heavy mount kit, 90 mm"),
   * perhaps with the plan's paired figures after it.
   */
  line: QuoteLineWords & { description: string };
}

/** A quote line's description with the engine's figures in the reader's unit system (see quoteLineTextOptions); the stored words stay as they are. */
export function LineDescription({ line }: LineDescriptionProps) {
  const { system } = useUnits();
  return <>{renderText(textParts(line.description, quoteLineTextOptions(line)), system)}</>;
}
