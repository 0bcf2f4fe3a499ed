import { ReaderCore } from './readerCore';
import type { ReaderOptions } from './sequenceReader';

/**
 * Format 'bytes': every byte is a symbol, labelled by its decimal value ('0'..'255'); ids follow the
 * order of first appearance like every other format. No decoding, so any file reads.
 */
export class BytesReader extends ReaderCore {
  /** id + 1 of each byte value seen (0: not yet seen). */
  private readonly ids = new Int32Array(256);
  private lineFeedCount = 0;

  constructor(options: ReaderOptions) {
    super(options, 1);
  }

  protected accept(chunk: Uint8Array): void {
    const out = this.symbols;
    const ids = this.ids;
    let lineFeeds = this.lineFeedCount;
    for (let i = 0; i < chunk.length; i++) {
      const b = chunk[i];
      if (b === 0x0a) lineFeeds++;
      let id = ids[b] - 1;
      if (id < 0) {
        id = this.table.intern(String(b));
        ids[b] = id + 1;
      }
      out.push(id);
    }
    this.lineFeedCount = lineFeeds;
  }

  protected end(): void {}

  protected lineFeeds(): number {
    return this.lineFeedCount;
  }
}
