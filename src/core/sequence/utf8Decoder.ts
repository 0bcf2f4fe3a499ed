/** Why a Utf8Decoder stopped before the end of its input. */
export type Utf8Stop = 'none' | 'invalid' | 'truncated' | 'nul';

/**
 * Streaming, validating UTF-8 decoder into code points. It follows the byte-at-a-time algorithm of
 * the WHATWG Encoding Standard (section "UTF-8 decoder": bytes needed, bytes seen, lower and upper
 * boundary), which accepts exactly the well-formed sequences of the Unicode Standard, Table 3-7
 * (no overlong forms, no surrogates, nothing above U+10FFFF). Instead of inserting U+FFFD it
 * stops at the first ill-formed sequence, because a reader must refuse such input with its
 * position. It also stops at a NUL byte, which text never holds and binary files nearly always do.
 *
 * Written by hand because src/core may not use TextDecoder (lib ES2022 only), and because a
 * reader needs the byte offset of the failure.
 */
export class Utf8Decoder {
  /** Code points of the last decode() call, valid up to the count it returned. Reused. */
  codePoints = new Int32Array(0);
  /** 0-based byte offset in the whole stream where codePoints[0] of the last batch begins. */
  batchStartByte = 0;
  /** Why decoding stopped; 'none' while all input so far was well formed. */
  stop: Utf8Stop = 'none';
  /** 0-based byte offset of the stop: the NUL byte or the first byte of the bad sequence. */
  stopByte = -1;
  /** For an 'invalid' stop: the first byte of the bad sequence and the byte that broke it (-1 when the first byte alone is bad). */
  stopLead = -1;
  stopNext = -1;

  private bomPending: boolean;
  private bytesSeen = 0;
  private needed = 0;
  private seen = 0;
  private codePoint = 0;
  private lower = 0x80;
  private upper = 0xbf;
  private sequenceStart = 0;
  private cacheIndex = 0;
  private cacheByte = 0;

  /** @param skipBom drop a U+FEFF byte order mark at the very start of the stream (default true). */
  constructor(skipBom = true) {
    this.bomPending = skipBom;
  }

  /**
   * Decodes the next bytes of the stream into `codePoints` and returns how many it holds. A
   * sequence cut at the end of `bytes` is completed by the next call. When it returns with
   * `stop !== 'none'`, the code points before the stop are valid and the decoder must not be fed
   * again.
   */
  decode(bytes: Uint8Array): number {
    if (this.stop !== 'none') throw new Error('Utf8Decoder: decode() after a stop');
    const length = bytes.length;
    if (this.codePoints.length < length) this.codePoints = new Int32Array(Math.max(length, 1024));
    const out = this.codePoints;
    const base = this.bytesSeen;
    this.batchStartByte = this.needed > 0 ? this.sequenceStart : base;
    let needed = this.needed;
    let seen = this.seen;
    let cp = this.codePoint;
    let lower = this.lower;
    let upper = this.upper;
    let n = 0;
    let i = 0;
    for (; i < length; i++) {
      const b = bytes[i];
      if (needed === 0) {
        if (b < 0x80) {
          if (b === 0) {
            this.halt('nul', base + i);
            break;
          }
          out[n++] = b;
          continue;
        }
        this.sequenceStart = base + i;
        this.stopLead = b;
        if (b >= 0xc2 && b <= 0xdf) {
          needed = 1;
          cp = b & 0x1f;
        } else if (b >= 0xe0 && b <= 0xef) {
          if (b === 0xe0) lower = 0xa0;
          else if (b === 0xed) upper = 0x9f;
          needed = 2;
          cp = b & 0x0f;
        } else if (b >= 0xf0 && b <= 0xf4) {
          if (b === 0xf0) lower = 0x90;
          else if (b === 0xf4) upper = 0x8f;
          needed = 3;
          cp = b & 0x07;
        } else {
          this.stopNext = -1;
          this.halt('invalid', base + i);
          break;
        }
        seen = 0;
      } else {
        if (b < lower || b > upper) {
          this.stopNext = seen === 0 ? b : -2 - b;
          this.halt('invalid', this.sequenceStart);
          break;
        }
        lower = 0x80;
        upper = 0xbf;
        cp = (cp << 6) | (b & 0x3f);
        if (++seen === needed) {
          out[n++] = cp;
          needed = 0;
        }
      }
    }
    this.bytesSeen = base + i;
    this.needed = needed;
    this.seen = seen;
    this.codePoint = cp;
    this.lower = lower;
    this.upper = upper;
    if (this.bomPending && n > 0) {
      this.bomPending = false;
      if (out[0] === 0xfeff) {
        out.copyWithin(0, 1, n);
        n--;
        this.batchStartByte += 3;
      }
    }
    this.cacheIndex = 0;
    this.cacheByte = this.batchStartByte;
    return n;
  }

  /** Ends the stream: a sequence still waiting for bytes becomes a 'truncated' stop. */
  finish(): void {
    if (this.stop === 'none' && this.needed > 0) this.halt('truncated', this.sequenceStart);
  }

  /**
   * Byte offset of codePoints[k] of the last batch. Meant for error positions: it walks from the
   * previous query (or the batch start), so increasing k within a batch costs O(n) in total.
   */
  byteOffsetOf(k: number): number {
    if (k < this.cacheIndex) {
      this.cacheIndex = 0;
      this.cacheByte = this.batchStartByte;
    }
    const cps = this.codePoints;
    let byte = this.cacheByte;
    for (let j = this.cacheIndex; j < k; j++) byte += utf8Length(cps[j]);
    this.cacheIndex = k;
    this.cacheByte = byte;
    return byte;
  }

  private halt(reason: Utf8Stop, byte: number): void {
    this.stop = reason;
    this.stopByte = byte;
  }
}

const hex = (b: number): string => `0x${b.toString(16).toUpperCase().padStart(2, '0')}`;

/**
 * Why the bytes at an 'invalid' stop are not UTF-8, in words, from the rows of the Unicode
 * Standard's Table 3-7 (well-formed byte sequences) that the sequence breaks.
 * @param lead first byte of the bad sequence
 * @param next -1 when the lead byte itself is bad; the second byte when it broke the sequence;
 *   -2 - b when a later byte b did
 */
export function describeInvalidUtf8(lead: number, next: number): string {
  if (lead >= 0x80 && lead <= 0xbf) return `a continuation byte ${hex(lead)} with no lead byte before it`;
  if (lead === 0xc0 || lead === 0xc1) return `an overlong encoding (lead byte ${hex(lead)} never starts a valid character)`;
  if (lead >= 0xf5) return `byte ${hex(lead)}, which never occurs in UTF-8`;
  if (next >= 0) {
    if (lead === 0xe0 && next < 0xa0 && next >= 0x80) return `an overlong encoding (${hex(lead)} ${hex(next)})`;
    if (lead === 0xf0 && next < 0x90 && next >= 0x80) return `an overlong encoding (${hex(lead)} ${hex(next)})`;
    if (lead === 0xed && next >= 0xa0 && next <= 0xbf) return `a surrogate code point (${hex(lead)} ${hex(next)}: U+D800 to U+DFFF are not characters)`;
    if (lead === 0xf4 && next >= 0x90 && next <= 0xbf) return `a code point above U+10FFFF (${hex(lead)} ${hex(next)})`;
  }
  const breaker = next >= 0 ? next : -2 - next;
  return `a character cut short: lead byte ${hex(lead)} is followed by ${hex(breaker)}, not by a continuation byte`;
}

/** Number of bytes UTF-8 uses for a code point (RFC 3629, section 3). */
export function utf8Length(cp: number): number {
  return cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
}
