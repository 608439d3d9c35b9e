/** Deepest object/array nesting a request body may have; our deepest DTO (a project with goals) needs 4. */
export const MAX_JSON_DEPTH = 32;

const OPEN_BRACE = 0x7b;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACE = 0x7d;
const CLOSE_BRACKET = 0x5d;
const QUOTE = 0x22;
const BACKSLASH = 0x5c;

/**
 * The deepest nesting of objects and arrays in raw JSON bytes, counted before parsing so a body thousands of
 * levels deep never reaches JSON.parse, class-transformer or class-validator (which recurse). Stops counting
 * as soon as `limit` is passed. Brackets inside strings do not count.
 */
export function jsonDepthExceeds(bytes: Uint8Array, limit: number = MAX_JSON_DEPTH): boolean {
  let depth = 0;
  let inString = false;
  for (let index = 0; index < bytes.length; index++) {
    const byte = bytes[index];
    if (inString) {
      if (byte === BACKSLASH) index++;
      else if (byte === QUOTE) inString = false;
    } else if (byte === QUOTE) {
      inString = true;
    } else if (byte === OPEN_BRACE || byte === OPEN_BRACKET) {
      depth++;
      if (depth > limit) return true;
    } else if (byte === CLOSE_BRACE || byte === CLOSE_BRACKET) {
      depth--;
    }
  }
  return false;
}
