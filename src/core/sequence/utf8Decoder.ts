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
          this.halt('invalid', base + i);
          break;
        }
        seen = 0;
      } else {
        if (b < lower || b > upper) {
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

/** Number of bytes UTF-8 uses for a code point (RFC 3629, section 3). */
export function utf8Length(cp: number): number {
  return cp < 0x80 ? 1 : cp < 0x800 ? 2 : cp < 0x10000 ? 3 : 4;
}
