import { countSymbols } from './countSymbols';
import { GrowableSymbols } from './growableSymbols';
import { ReadError } from './readError';
import { SymbolTable } from './symbolTable';
import type { FastaRecord, ReadResult, ReadWarning, ReaderOptions, SequenceReader } from './sequenceReader';

/**
 * What every reader shares: the growing symbol array, the label table, warnings and details, the
 * byte count, and the rule that a reader which failed keeps failing with the same error.
 */
export abstract class ReaderCore implements SequenceReader {
  protected readonly symbols: GrowableSymbols;
  protected readonly table = new SymbolTable();
  protected readonly warnings: ReadWarning[] = [];
  protected readonly details: Record<string, number> = {};
  protected bytesRead = 0;
  private lastByte = -1;
  private failure: unknown = undefined;
  private lifecycle: 'open' | 'failed' | 'finished' = 'open';

  /**
   * @param minBytesPerSymbol fewest input bytes one symbol can take in this format (with its
   *   separator), so that sizeHint / minBytesPerSymbol bounds the number of symbols.
   */
  protected constructor(options: ReaderOptions, minBytesPerSymbol: number) {
    const max = options.maxSymbols ?? Infinity;
    const hint = options.sizeHint;
    const shared = options.sharedMemory === true;
    this.symbols =
      hint === undefined
        ? new GrowableSymbols(undefined, max, shared)
        : new GrowableSymbols(Math.floor((hint + minBytesPerSymbol - 1) / minBytesPerSymbol), max, shared);
  }

  push(chunk: Uint8Array): void {
    this.checkOpen('push');
    try {
      this.bytesRead += chunk.length;
      if (chunk.length > 0) this.lastByte = chunk[chunk.length - 1];
      this.accept(chunk);
    } catch (e) {
      this.fail(e);
    }
  }

  finish(): ReadResult {
    this.checkOpen('finish');
    try {
      this.end();
      const result = this.assemble();
      this.lifecycle = 'finished';
      return result;
    } catch (e) {
      this.fail(e);
    }
  }

  /** Takes the next chunk of input. */
  protected abstract accept(chunk: Uint8Array): void;
  /** Handles the end of input (pending tokens, open records, truncated sequences). */
  protected abstract end(): void;
  /** Line feeds (byte 10) read so far. */
  protected abstract lineFeeds(): number;
  /** Why no symbol came out, beyond "the file holds no symbols" (e.g. all cells empty). */
  protected emptyReason(): string {
    return '';
  }
  /** fasta only. */
  protected recordList(): FastaRecord[] | undefined {
    return undefined;
  }

  private assemble(): ReadResult {
    const symbols = this.symbols.toSymbolArray();
    if (symbols.length === 0) {
      const reason = this.bytesRead === 0 ? '0 bytes' : this.emptyReason();
      throw new ReadError('empty', `the file holds no symbols${reason === '' ? '' : ` (${reason})`}`);
    }
    const result: ReadResult = {
      sequence: { symbols, alphabet: this.table.labels, counts: countSymbols(symbols, this.table.size) },
      warnings: this.warnings,
      bytesRead: this.bytesRead,
      lines: this.bytesRead === 0 ? 0 : this.lineFeeds() + (this.lastByte === 0x0a ? 0 : 1),
      details: this.details,
    };
    const records = this.recordList();
    if (records !== undefined) result.records = records;
    return result;
  }

  private checkOpen(call: string): void {
    if (this.lifecycle === 'failed') throw this.failure;
    if (this.lifecycle === 'finished') throw new Error(`SequenceReader.${call}() after finish()`);
  }

  private fail(e: unknown): never {
    this.lifecycle = 'failed';
    this.failure = e;
    throw e;
  }
}
