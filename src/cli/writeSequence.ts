import type { Writable } from 'node:stream';
import type { Sequence } from '../core';
import { openOutput } from './outputStream';

const SYMBOLS_PER_LINE = 100;
const FLUSH_CHARS = 1 << 20;

/**
 * Write a sequence as text: one character per symbol (100 to a line) when every label is a single
 * character, else the labels separated by spaces (100 to a line). Either form reads back with
 * `--format chars` or `--format tokens` respectively. '-' writes to `stdout` (default
 * process.stdout).
 * @throws OutputError when the file cannot be written
 */
export async function writeSequence(sequence: Sequence, path: string, stdout: Writable = process.stdout): Promise<'chars' | 'tokens'> {
  const { symbols, alphabet } = sequence;
  const asChars = alphabet.every((label) => [...label].length === 1 && label.trim() === label);
  const separator = asChars ? '' : ' ';
  const out = openOutput(path, stdout);
  let buffer = '';
  for (let i = 0; i < symbols.length; i++) {
    const endOfLine = (i + 1) % SYMBOLS_PER_LINE === 0 || i + 1 === symbols.length;
    buffer += alphabet[symbols[i]!]! + (endOfLine ? '\n' : separator);
    if (buffer.length >= FLUSH_CHARS) {
      await out.write(buffer);
      buffer = '';
    }
  }
  if (buffer !== '') await out.write(buffer);
  await out.close();
  return asChars ? 'chars' : 'tokens';
}
