import type { ReaderOptions } from './sequenceReader';
import { TextReader } from './textReader';
import { WHITESPACE_CLASS, WS_LF, WS_NONE, WS_SPACE, WS_TABLE_SIZE } from './whitespace';

/**
 * Format 'chars': every Unicode code point except whitespace is a symbol, labelled by the
 * character itself. With keepWhitespace, spaces, tabs and other Unicode spaces are symbols too;
 * line breaks never are. No Unicode normalization: precomposed and combining forms differ.
 */
export class CharsReader extends TextReader {
  private readonly keepWhitespace: boolean;
  /** id + 1 of each BMP code point seen (0: not yet seen). */
  private readonly bmpIds = new Int32Array(0x10000);
  private readonly astralIds = new Map<number, number>();

  constructor(options: ReaderOptions) {
    super(options, 1);
    this.keepWhitespace = options.keepWhitespace ?? false;
  }

  protected consume(cps: Int32Array, n: number): void {
    const out = this.symbols;
    const bmpIds = this.bmpIds;
    const keep = this.keepWhitespace;
    const base = this.cpBase;
    let line = this.line;
    let lineStart = this.lineStartCp;
    for (let k = 0; k < n; k++) {
      const cp = cps[k];
      if (cp < WS_TABLE_SIZE) {
        const ws = WHITESPACE_CLASS[cp];
        if (ws !== WS_NONE) {
          if (ws === WS_LF) {
            line++;
            lineStart = base + k + 1;
            continue;
          }
          if (ws !== WS_SPACE || !keep) continue;
        }
      }
      let id: number;
      if (cp < 0x10000) {
        id = bmpIds[cp] - 1;
        if (id < 0) {
          id = this.table.intern(String.fromCharCode(cp));
          bmpIds[cp] = id + 1;
        }
      } else {
        id = this.astralIds.get(cp) ?? -1;
        if (id < 0) {
          id = this.table.intern(String.fromCodePoint(cp));
          this.astralIds.set(cp, id);
        }
      }
      out.push(id);
    }
    this.line = line;
    this.lineStartCp = lineStart;
  }

  protected endOfText(): void {}

  protected override emptyReason(): string {
    return this.bytesRead > 0 ? 'only whitespace' : '';
  }
}
