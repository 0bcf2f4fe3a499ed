import type { InputFormat } from './sequenceReader';

const EXTENSION_FORMATS: Readonly<Record<string, InputFormat>> = {
  csv: 'csv',
  tsv: 'csv',
  fa: 'fasta',
  fasta: 'fasta',
  fna: 'fasta',
  ffn: 'fasta',
  faa: 'fasta',
  bin: 'bytes',
  dat: 'bytes',
};

/** Bytes of a file's start that guessFormat looks at. */
export const SNIFF_BYTES = 1 << 16;
const SEPARATOR = /[ \t\f\v,;]+/;
const LINE_BREAK = /\r?\n/;

/**
 * The reader for a file when the user names none; one rule for the page and the command line:
 * 1. by extension: CSV/TSV, FASTA, .bin/.dat as bytes;
 * 2. lines holding several fields (separated by spaces, tabs, commas or semicolons): 'tokens' when a
 *    field is longer than one character ("N NE E", "12 7 33"), else 'chars' ("0 1 1 0");
 * 3. one field per line: 'tokens' when the lines differ in length ("12", "7", "33") or all have 2 or
 *    3 characters (fixed-width codes such as "NE", "SW"); 'chars' for lines of one character or of
 *    equal length of 4 or more (a symbol text broken into lines, "0110100...").
 * @param head the decoded start of the file; a last line without its line break is ignored because
 *   the window may have cut it
 */
export function guessFormat(fileName: string, head: string): InputFormat {
  const dot = fileName.lastIndexOf('.');
  const extension = dot < 0 ? '' : fileName.slice(dot + 1).toLowerCase();
  const known = EXTENSION_FORMATS[extension];
  if (known !== undefined) return known;
  const lines = head.split(LINE_BREAK);
  if (lines.length > 1) lines.pop();
  const fieldsPerLine = lines.map((line) => line.split(SEPARATOR).filter((f) => f !== ''));
  const filled = fieldsPerLine.filter((fields) => fields.length > 0);
  if (filled.length === 0) return 'chars';
  if (filled.some((fields) => fields.length > 1)) {
    return filled.some((fields) => fields.some((f) => [...f].length > 1)) ? 'tokens' : 'chars';
  }
  const lengths = new Set(filled.map((fields) => [...fields[0]].length));
  if (lengths.size > 1) return 'tokens';
  const only = [...lengths][0];
  return only === 2 || only === 3 ? 'tokens' : 'chars';
}
