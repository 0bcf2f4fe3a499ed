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
const SEPARATOR = /[\s,;]+/;

/**
 * The reader for a file when the user names none; one rule for the page and the command line: by
 * extension (CSV/TSV, FASTA, .bin/.dat as bytes), else 'tokens' when the file's first SNIFF_BYTES
 * hold a field longer than one character between whitespace, commas or semicolons, else 'chars'.
 * @param head the decoded start of the file; its last field is ignored because the window may cut it
 */
export function guessFormat(fileName: string, head: string): InputFormat {
  const dot = fileName.lastIndexOf('.');
  const extension = dot < 0 ? '' : fileName.slice(dot + 1).toLowerCase();
  const known = EXTENSION_FORMATS[extension];
  if (known !== undefined) return known;
  const fields = head.split(SEPARATOR);
  fields.pop();
  return fields.some((f) => [...f].length > 1) ? 'tokens' : 'chars';
}
