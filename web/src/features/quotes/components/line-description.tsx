import { renderText, textParts } from '@swapwright/shared';
import { useUnits } from '@/hooks/use-units';

export interface LineDescriptionProps {
  /** The line's stored words; a line drawn from the parts plan carries the engine's figures ("8.7 mm (0.34 in)"). */
  text: string;
}

/** A quote line's description with every figure in the reader's unit system; the stored description stays as it is. */
export function LineDescription({ text }: LineDescriptionProps) {
  const { system } = useUnits();
  return <>{renderText(textParts(text), system)}</>;
}
