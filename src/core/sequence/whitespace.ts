/** Class of a code point for the text readers: not whitespace. */
export const WS_NONE = 0;
/** Space-like whitespace: space, tab, no-break and other Unicode spaces. */
export const WS_SPACE = 1;
/** A line break other than LF: CR, VT, FF, NEL (U+0085), U+2028, U+2029. */
export const WS_BREAK = 2;
/** Line feed, the character that ends a line for line and column counting. */
export const WS_LF = 3;

/** Table size: the largest White_Space code point is U+3000. */
export const WS_TABLE_SIZE = 0x3001;

/**
 * Whitespace classes for code points below WS_TABLE_SIZE; all others are WS_NONE. The set is the
 * Unicode White_Space property (Unicode Character Database, PropList.txt).
 */
export const WHITESPACE_CLASS: Uint8Array = buildTable();

function buildTable(): Uint8Array {
  const t = new Uint8Array(WS_TABLE_SIZE);
  for (const cp of [0x09, 0x20, 0xa0, 0x1680, 0x202f, 0x205f, 0x3000]) t[cp] = WS_SPACE;
  for (let cp = 0x2000; cp <= 0x200a; cp++) t[cp] = WS_SPACE;
  for (const cp of [0x0b, 0x0c, 0x0d, 0x85, 0x2028, 0x2029]) t[cp] = WS_BREAK;
  t[0x0a] = WS_LF;
  return t;
}
