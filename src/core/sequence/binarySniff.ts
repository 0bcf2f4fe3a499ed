/** Bytes at the start of a text input inspected for signs of binary data. */
export const SNIFF_BYTES = 8192;

/** Share of control bytes above which the sniffed window is taken for binary data. */
const CONTROL_SHARE = 0.1;

export interface BinaryEvidence {
  /** 'nul': a NUL byte; 'control': many control bytes; 'utf16': a UTF-16 byte order mark. */
  readonly reason: 'nul' | 'control' | 'utf16';
  /** 0-based byte offset of the first telling byte. */
  readonly byte: number;
}

/**
 * Looks for binary data in the first bytes of a file meant as text: a UTF-16 byte order mark, a NUL
 * byte (git's text/binary test, which looks for NUL in the first 8000 bytes; from memory), or more
 * than 10% control bytes other than tab, line breaks and ESC (a threshold in the spirit of
 * file(1)'s text test; common practice, no source). Returns null when the window looks like text.
 */
export function findBinaryEvidence(window: Uint8Array): BinaryEvidence | null {
  const n = window.length;
  if (n >= 2 && ((window[0] === 0xff && window[1] === 0xfe) || (window[0] === 0xfe && window[1] === 0xff))) {
    return { reason: 'utf16', byte: 0 };
  }
  let controls = 0;
  let firstControl = -1;
  for (let i = 0; i < n; i++) {
    const b = window[i];
    if (b === 0) return { reason: 'nul', byte: i };
    if (isControlByte(b)) {
      if (firstControl < 0) firstControl = i;
      controls++;
    }
  }
  return controls > CONTROL_SHARE * n ? { reason: 'control', byte: firstControl } : null;
}

function isControlByte(b: number): boolean {
  // TAB, LF, VT, FF, CR (0x09..0x0D) and ESC (terminal colour codes in logs) occur in text.
  return (b < 0x20 && (b < 0x09 || b > 0x0d) && b !== 0x1b) || b === 0x7f;
}
