import { createWriteStream } from 'node:fs';
import type { Sequence } from '../core/sequence/sequence';

const SYMBOLS_PER_LINE = 100;
const FLUSH_CHARS = 1 << 20;

/**
 * Write a sequence as text: one character per symbol (100 to a line) when every label is a single
 * character, else the labels separated by spaces (100 to a line). Either form reads back with
 * `--format chars` or `--format tokens` respectively. '-' writes to standard output.
 */
export async function writeSequence(sequence: Sequence, path: string): Promise<'chars' | 'tokens'> {
  const { symbols, alphabet } = sequence;
  const asChars = alphabet.every((label) => [...label].length === 1 && label.trim() === label);
  const separator = asChars ? '' : ' ';
  const out = path === '-' ? process.stdout : createWriteStream(path);
  let buffer = '';
  const flush = async (): Promise<void> => {
    if (buffer === '') return;
    const chunk = buffer;
    buffer = '';
    if (!out.write(chunk)) await new Promise<void>((resolve) => out.once('drain', () => resolve()));
  };
  for (let i = 0; i < symbols.length; i++) {
    const endOfLine = (i + 1) % SYMBOLS_PER_LINE === 0 || i + 1 === symbols.length;
    buffer += alphabet[symbols[i]!]! + (endOfLine ? '\n' : separator);
    if (buffer.length >= FLUSH_CHARS) await flush();
  }
  await flush();
  if (out !== process.stdout) {
    await new Promise<void>((resolve, reject) => {
      out.once('error', reject);
      out.end(() => resolve());
    });
  }
  return asChars ? 'chars' : 'tokens';
}
