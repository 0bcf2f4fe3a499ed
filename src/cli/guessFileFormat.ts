import { open } from 'node:fs/promises';
import { SNIFF_BYTES, guessFormat } from '../core';
import type { InputFormat } from '../core';

/** The reading format of a file when the user names none (the rule is core's guessFormat). */
export async function guessFileFormat(path: string): Promise<InputFormat> {
  let head = '';
  try {
    const handle = await open(path, 'r');
    try {
      const buffer = Buffer.alloc(SNIFF_BYTES);
      const { bytesRead } = await handle.read(buffer, 0, SNIFF_BYTES, 0);
      head = buffer.subarray(0, bytesRead).toString('utf8');
    } finally {
      await handle.close();
    }
  } catch {
    // A missing or unreadable file is reported by the reader with its own message.
  }
  return guessFormat(path, head);
}
