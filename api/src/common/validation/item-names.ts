/**
 * How a list item is named in validation messages: "Line 2 (Notch crossmember): hours …" rather than the
 * property path "lines.1.hours …". Put `@NamedInMessages(…)` on the item's DTO class; the validation pipe asks it
 * for the name of each refused item by the item's value and its place in the list (0-based).
 */
const ITEM_NAME = Symbol('itemName');

export type ItemNamer = (item: Record<string, unknown>, index: number) => string;

export function NamedInMessages(namer: ItemNamer): ClassDecorator {
  return (target) => {
    Reflect.defineMetadata(ITEM_NAME, namer, target);
  };
}

/** The item's name in words, or null when its class names none (or the value is not such an item). */
export function itemName(value: unknown, property: string): string | null {
  if (!/^\d+$/.test(property) || typeof value !== 'object' || value === null) return null;
  const namer = Reflect.getMetadata(ITEM_NAME, value.constructor) as ItemNamer | undefined;
  return namer ? namer(value as Record<string, unknown>, Number(property)) : null;
}

/** "Notch crossmember" as a short quote inside a message: trimmed, at most `max` characters, cut after a word. */
export function shortText(text: unknown, max = 48): string | null {
  if (typeof text !== 'string') return null;
  const plain = text.replace(/\s+/g, ' ').trim();
  if (!plain) return null;
  if (plain.length <= max) return plain;
  const cut = plain.slice(0, max - 1);
  const lastSpace = cut.lastIndexOf(' ');
  // end on a whole word when one ends near the limit
  return `${(lastSpace >= max / 2 ? cut.slice(0, lastSpace) : cut).trimEnd()}…`;
}
