import { findBinaryEvidence, SNIFF_BYTES } from './binarySniff';
import type { BinaryEvidence } from './binarySniff';
import { ReadError } from './readError';
import type { InputPosition } from './readError';
import { ReaderCore } from './readerCore';
import { Utf8Decoder, describeInvalidUtf8 } from './utf8Decoder';

/** Bytes decoded per batch, so a huge single chunk never needs a huge code point buffer. */
const SLICE_BYTES = 1 << 16;

/** Most bytes held back for prefixReady; a format must decide from this much. */
const PREFIX_CAP = 1 << 20;

const BYTES_HINT = 'read it as bytes (--format bytes)';

/**
 * Base of the UTF-8 text readers. It holds back the first bytes until the binary sniff window
 * (and whatever the format needs to see first, e.g. CSV's first line) is complete, then decodes in
 * slices and hands code points to `consume`. Subclasses keep `line` and `lineStartCp` current as
 * they pass line feeds; positions of errors derive from them.
 */
export abstract class TextReader extends ReaderCore {
  /** 1-based line of the code point being consumed. */
  protected line = 1;
  /** Index (over all code points of the input) of the current line's first code point. */
  protected lineStartCp = 0;
  /** Index (over all code points of the input) of codePoints[0] in the batch being consumed. */
  protected cpBase = 0;
  private readonly decoder = new Utf8Decoder(true);
  private prefix: Uint8Array | null = new Uint8Array(SNIFF_BYTES);
  private prefixLength = 0;

  /** Takes the code points cps[0..n) of the next batch. */
  protected abstract consume(cps: Int32Array, n: number): void;
  /** The decoded text has ended. */
  protected abstract endOfText(): void;

  /**
   * Whether the held-back start of the input is enough for `onPrefix`; called as bytes arrive
   * (a subclass may scan incrementally). At most 1 MiB is held: onPrefix then gets that much, or
   * the whole input if shorter. Default: nothing beyond the sniff window is needed.
   */
  protected prefixReady(_bytes: Uint8Array, _length: number): boolean {
    return true;
  }

  /** Sees the start of the input (the sniff window, and more if prefixReady asked for it). */
  protected onPrefix(_bytes: Uint8Array): void {}

  /** Position of cps[k] of the current batch, on the given line. */
  protected positionAt(k: number, line: number, lineStartCp: number): InputPosition {
    return { line, column: this.cpBase + k - lineStartCp + 1, byte: this.byteOffsetAt(k) };
  }

  /** Byte offset of cps[k] of the current batch; cheap for increasing k within a batch. */
  protected byteOffsetAt(k: number): number {
    return this.decoder.byteOffsetOf(k);
  }

  protected accept(chunk: Uint8Array): void {
    let rest = chunk;
    while (this.prefix !== null && rest.length > 0) {
      const take = Math.min(rest.length, PREFIX_CAP - this.prefixLength);
      this.hold(rest.subarray(0, take));
      rest = rest.subarray(take);
      const full = this.prefixLength >= PREFIX_CAP;
      if (full || (this.prefixLength >= SNIFF_BYTES && this.prefixReady(this.prefix, this.prefixLength))) this.release();
    }
    if (rest.length > 0) this.feed(rest);
  }

  protected end(): void {
    if (this.prefix !== null) this.release();
    this.decoder.finish();
    if (this.decoder.stop !== 'none') throw this.stopError();
    this.endOfText();
  }

  protected lineFeeds(): number {
    return this.line - 1;
  }

  private hold(chunk: Uint8Array): void {
    let prefix = this.prefix as Uint8Array;
    const needed = this.prefixLength + chunk.length;
    if (needed > prefix.length) {
      const bigger = new Uint8Array(Math.max(needed, prefix.length * 2));
      bigger.set(prefix.subarray(0, this.prefixLength));
      prefix = bigger;
      this.prefix = bigger;
    }
    prefix.set(chunk, this.prefixLength);
    this.prefixLength = needed;
  }

  private release(): void {
    const bytes = (this.prefix as Uint8Array).subarray(0, this.prefixLength);
    this.prefix = null;
    const evidence = findBinaryEvidence(bytes.subarray(0, SNIFF_BYTES));
    if (evidence !== null) throw binaryError(evidence, bytes);
    this.onPrefix(bytes);
    this.feed(bytes);
  }

  private feed(bytes: Uint8Array): void {
    const decoder = this.decoder;
    for (let start = 0; start < bytes.length; start += SLICE_BYTES) {
      const n = decoder.decode(bytes.subarray(start, start + SLICE_BYTES));
      this.consume(decoder.codePoints, n);
      this.cpBase += n;
      if (decoder.stop !== 'none') throw this.stopError();
    }
  }

  /** The error for a decoder stop, placed after the code points consumed before it. */
  private stopError(): ReadError {
    const { stop, stopByte } = this.decoder;
    const position = { line: this.line, column: this.cpBase - this.lineStartCp + 1, byte: stopByte };
    if (stop === 'nul') {
      return new ReadError('binary-in-text', `a NUL byte: this looks like binary data, not UTF-8 text; ${BYTES_HINT}`, position);
    }
    const what = stop === 'truncated' ? 'the input ends inside a UTF-8 character' : `invalid UTF-8: ${describeInvalidUtf8(this.decoder.stopLead, this.decoder.stopNext)}`;
    return new ReadError('invalid-utf8', `${what}; save the file as UTF-8, or if it is not text, ${BYTES_HINT}`, position);
  }
}

function binaryError(evidence: BinaryEvidence, bytes: Uint8Array): ReadError {
  const position = positionOfByte(bytes, evidence.byte);
  switch (evidence.reason) {
    case 'utf16':
      return new ReadError('invalid-utf8', `UTF-16 text (byte order mark); save it as UTF-8, or ${BYTES_HINT}`, position);
    case 'nul':
      return new ReadError('binary-in-text', `a NUL byte: this looks like binary data (or UTF-16 text), not UTF-8 text; ${BYTES_HINT}`, position);
    case 'control':
      return new ReadError('binary-in-text', `more than 10% control characters in the first ${Math.min(bytes.length, SNIFF_BYTES)} bytes: this looks like binary data, not text; ${BYTES_HINT}`, position);
  }
}

/** Line and code point column of a byte inside the held-back start of the input. */
function positionOfByte(bytes: Uint8Array, byte: number): InputPosition {
  let line = 1;
  let lineStart = 0;
  for (let i = 0; i < byte; i++) {
    if (bytes[i] === 0x0a) {
      line++;
      lineStart = i + 1;
    }
  }
  // The decoder drops a leading byte order mark, so columns on line 1 do not count it.
  if (line === 1 && byte >= 3 && bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) lineStart = 3;
  let column = 1;
  for (let i = lineStart; i < byte; i++) if ((bytes[i] & 0xc0) !== 0x80) column++;
  return { line, column, byte };
}
