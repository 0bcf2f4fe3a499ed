import { CodeUnitBuffer } from './codeUnitBuffer';
import type { ReaderOptions } from './sequenceReader';
import { TextReader } from './textReader';
import { WHITESPACE_CLASS, WS_LF, WS_NONE, WS_TABLE_SIZE } from './whitespace';

const COMMA = 0x2c;
const SEMICOLON = 0x3b;

/**
 * Format 'tokens': the text is split at whitespace, commas and semicolons (a run of separators
 * counts as one) and every distinct token is a symbol labelled by its text, e.g. integers or words.
 * "07" and "7" are different tokens.
 */
export class TokensReader extends TextReader {
  private readonly token = new CodeUnitBuffer();
  /** id + 1 of one-code-unit tokens (0: not yet seen), to skip building a string for them. */
  private readonly singleIds = new Int32Array(0x10000);

  constructor(options: ReaderOptions) {
    // A token takes one byte and needs a separator before the next one.
    super(options, 2);
  }

  protected consume(cps: Int32Array, n: number): void {
    const token = this.token;
    const base = this.cpBase;
    let line = this.line;
    let lineStart = this.lineStartCp;
    for (let k = 0; k < n; k++) {
      const cp = cps[k];
      const ws = cp < WS_TABLE_SIZE ? WHITESPACE_CLASS[cp] : WS_NONE;
      if (ws === WS_NONE && cp !== COMMA && cp !== SEMICOLON) {
        token.pushCodePoint(cp);
        continue;
      }
      if (ws === WS_LF) {
        line++;
        lineStart = base + k + 1;
      }
      if (token.length > 0) this.emitToken();
    }
    this.line = line;
    this.lineStartCp = lineStart;
  }

  protected endOfText(): void {
    if (this.token.length > 0) this.emitToken();
  }

  protected override emptyReason(): string {
    return this.bytesRead > 0 ? 'only whitespace and separators' : '';
  }

  private emitToken(): void {
    const token = this.token;
    let id: number;
    if (token.length === 1) {
      const unit = token.unitAt(0);
      id = this.singleIds[unit] - 1;
      if (id < 0) {
        id = this.table.intern(token.text());
        this.singleIds[unit] = id + 1;
      }
    } else {
      id = this.table.intern(token.text());
    }
    this.symbols.push(id);
    token.clear();
  }
}
