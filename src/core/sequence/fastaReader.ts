import { CodeUnitBuffer } from './codeUnitBuffer';
import { ReadError } from './readError';
import type { InputPosition } from './readError';
import type { FastaRecord, ReaderOptions } from './sequenceReader';
import { TextReader } from './textReader';

const BAD = 0;
const BASE = 1;
const AMBIGUITY = 2;
const GAP = 3;
const SKIP = 4;

const LF = 0x0a;
const GT = 0x3e;
const SEMICOLON = 0x3b;

const LINE_START = 0;
const HEADER = 1;
const COMMENT = 2;
const SEQUENCE = 3;

/** Longest record name kept, in UTF-16 code units; the rest of a header line is dropped. */
const MAX_NAME = 4096;

/**
 * Character classes of the nucleotide alphabet: bases A C G T U, the IUPAC ambiguity codes R Y S W
 * K M B D H V N (Cornish-Bowden, Nucleic Acids Res. 13 (1985) 3021-3030, NC-IUB nomenclature) and
 * '-' for a gap, upper and lower case; space, tab, CR, VT and FF inside sequence lines are ignored.
 */
const CLASS: Uint8Array = buildClasses();

function buildClasses(): Uint8Array {
  const c = new Uint8Array(128);
  for (const ch of 'ACGTU') c[ch.charCodeAt(0)] = c[ch.toLowerCase().charCodeAt(0)] = BASE;
  for (const ch of 'RYSWKMBDHVN') c[ch.charCodeAt(0)] = c[ch.toLowerCase().charCodeAt(0)] = AMBIGUITY;
  c[0x2d] = GAP;
  for (const cp of [0x09, 0x0b, 0x0c, 0x0d, 0x20]) c[cp] = SKIP;
  return c;
}

/**
 * Format 'fasta': '>' lines start a record named by the rest of the line (trimmed), ';' lines are
 * comments, empty lines are ignored; every other line holds bases. Bases before the first header
 * are accepted as a record with the empty name (with a warning), so a plain file of bases reads
 * too. Any character outside the nucleotide alphabet is ReadError 'bad-fasta' with its position.
 */
export class FastaReader extends TextReader {
  private readonly caseFold: boolean;
  private readonly policy: 'skip' | 'symbol' | 'error';
  /** id + 1 of each (folded) ASCII code seen as a symbol. */
  private readonly ids = new Int32Array(128);
  /** Occurrences of each (folded) ambiguity or gap code. */
  private readonly ambiguityCounts = new Float64Array(128);
  private readonly header = new CodeUnitBuffer();
  private readonly records: FastaRecord[] = [];
  private mode = LINE_START;
  private headersSeen = 0;
  private unnamedRecord = false;

  constructor(options: ReaderOptions) {
    super(options, 1);
    this.caseFold = options.caseFold ?? true;
    this.policy = options.ambiguity ?? 'skip';
    if (this.policy !== 'skip' && this.policy !== 'symbol' && this.policy !== 'error') {
      throw new ReadError('bad-option', `ambiguity must be 'skip', 'symbol' or 'error', got '${String(this.policy)}'`);
    }
    const records = options.fastaRecords;
    if (records !== undefined && records !== 'concatenate' && records !== 'separate') {
      throw new ReadError('bad-option', `fastaRecords must be 'concatenate' or 'separate', got '${String(records)}'`);
    }
  }

  protected consume(cps: Int32Array, n: number): void {
    const out = this.symbols;
    const ids = this.ids;
    const fold = this.caseFold;
    const base = this.cpBase;
    let line = this.line;
    let lineStart = this.lineStartCp;
    let mode = this.mode;
    for (let k = 0; k < n; k++) {
      let cp = cps[k];
      if (cp === LF) {
        if (mode === HEADER) this.closeHeader();
        line++;
        lineStart = base + k + 1;
        mode = LINE_START;
        continue;
      }
      if (mode === LINE_START) {
        if (cp === GT) {
          mode = HEADER;
          this.header.clear();
          continue;
        }
        mode = cp === SEMICOLON ? COMMENT : SEQUENCE;
      }
      if (mode === HEADER) {
        if (this.header.length < MAX_NAME) this.header.pushCodePoint(cp);
        continue;
      }
      if (mode === COMMENT) continue;
      const cls = cp < 128 ? CLASS[cp] : BAD;
      if (cls === SKIP) continue;
      if (cls === BAD) {
        this.mode = mode;
        throw this.badCharacter(cp, this.positionAt(k, line, lineStart));
      }
      if (this.records.length === 0) this.openUnnamedRecord();
      if (fold && cp >= 0x61) cp -= 0x20;
      if (cls !== BASE) {
        this.ambiguityCounts[cp]++;
        if (this.policy === 'skip') continue;
        if (this.policy === 'error') {
          throw new ReadError('bad-fasta', `${cls === GAP ? 'gap' : 'ambiguity code'} '${String.fromCharCode(cp)}' where the ambiguity policy is 'error'`, this.positionAt(k, line, lineStart));
        }
      }
      let id = ids[cp] - 1;
      if (id < 0) {
        id = this.table.intern(String.fromCharCode(cp));
        ids[cp] = id + 1;
      }
      out.push(id);
    }
    this.line = line;
    this.lineStartCp = lineStart;
    this.mode = mode;
  }

  protected endOfText(): void {
    if (this.mode === HEADER) this.closeHeader();
    this.closeRecord();
    this.reportAmbiguity();
    this.reportRecords();
  }

  protected override recordList(): FastaRecord[] {
    return this.records;
  }

  protected override emptyReason(): string {
    const skipped = this.details['ambiguity'] + this.details['gaps'];
    if (skipped > 0 && this.policy === 'skip') return `all ${skipped} sequence characters were ambiguity codes or gaps, which the 'skip' policy drops`;
    return this.records.length > 0 ? 'the records hold no bases' : '';
  }

  private closeHeader(): void {
    this.closeRecord();
    this.headersSeen++;
    this.records.push({ name: this.header.text().trim(), start: this.symbols.length, length: 0 });
  }

  private openUnnamedRecord(): void {
    this.unnamedRecord = true;
    this.records.push({ name: '', start: 0, length: 0 });
  }

  private closeRecord(): void {
    const last = this.records[this.records.length - 1];
    if (last !== undefined) last.length = this.symbols.length - last.start;
  }

  private badCharacter(cp: number, position: InputPosition): ReadError {
    const shown = cp >= 0x21 && cp !== 0x7f ? `'${String.fromCodePoint(cp)}'` : `U+${cp.toString(16).toUpperCase().padStart(4, '0')}`;
    const hint = this.headersSeen === 0 ? "; no '>' header so far: if this is not FASTA, read it as characters (--format chars)" : '';
    return new ReadError('bad-fasta', `${shown} is not a nucleotide code (A C G T U, IUPAC ambiguity codes or '-')${hint}`, position);
  }

  private reportAmbiguity(): void {
    const counts = this.ambiguityCounts;
    const parts: string[] = [];
    let ambiguity = 0;
    for (let cp = 0; cp < 128; cp++) {
      if (counts[cp] === 0 || cp === 0x2d) continue;
      const code = String.fromCharCode(cp);
      this.details[`ambiguity:${code}`] = counts[cp];
      ambiguity += counts[cp];
      parts.push(`${code} ${counts[cp]}`);
    }
    const gaps = counts[0x2d];
    if (gaps > 0) parts.push(`- ${gaps}`);
    this.details['ambiguity'] = ambiguity;
    this.details['gaps'] = gaps;
    if (this.policy === 'skip' && ambiguity + gaps > 0) {
      this.warnings.push({
        code: 'fasta-ambiguity-skipped',
        message: `skipped ${ambiguity + gaps} ambiguity codes and gaps (${parts.join(', ')}); the bases on either side become neighbours`,
      });
    }
  }

  private reportRecords(): void {
    const records = this.records;
    this.details['records'] = records.length;
    if (this.unnamedRecord) {
      this.warnings.push(
        this.headersSeen === 0
          ? { code: 'fasta-no-header', message: "no '>' header: the whole file was read as one record" }
          : { code: 'fasta-data-before-header', message: "bases before the first '>' header were read as a record with an empty name" },
      );
    }
    const empty = records.filter((r) => r.length === 0);
    if (empty.length > 0) {
      this.warnings.push({
        code: 'fasta-empty-record',
        message: `${empty.length} record${empty.length === 1 ? '' : 's'} hold${empty.length === 1 ? 's' : ''} no symbols (first: '${empty[0].name}')`,
      });
    }
  }
}
