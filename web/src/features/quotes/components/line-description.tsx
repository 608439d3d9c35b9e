import { renderText, textParts } from '@swapwright/shared';
import { useUnits } from '@/hooks/use-units';

export interface LineDescriptionProps {
  /**
   * The line's kind and stored words. A labor line drawn from the parts plan carries the engine's figures
   * ("8.7 mm (0.34 in)"); a part line carries the part's name as its maker prints it ("Heavy mount kit, 90 mm"),
   * perhaps with the plan's paired figures after it.
   */
  line: { kind: 'part' | 'labor'; description: string };
}

/**
 * A quote line's description with the engine's figures in the reader's unit system. A part line converts only the
 * engine's paired lengths: a lone figure there is part of the name, which the customer, the counter and the supplier
 * must all read alike. The stored words stay as they are.
 */
export function LineDescription({ line }: LineDescriptionProps) {
  const { system } = useUnits();
  return <>{renderText(textParts(line.description, { pairedLengthsOnly: line.kind === 'part' }), system)}</>;
}
