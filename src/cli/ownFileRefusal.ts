import { open } from 'node:fs/promises';
import { ReadError } from '../core';

/** Bytes read from the head: every file this program writes names its schema first. */
const HEAD_BYTES = 4096;

/** `"schema": "returnrate.NAME/VERSION"` near the top of a JSON object. */
const OWN_SCHEMA = /"schema"\s*:\s*"returnrate\.([a-z-]+)\/(\d+)"/;

/** What to do with each of our files instead of reading it as a sequence. */
const ADVICE: Readonly<Record<string, string>> = {
  session: 'a workbench session file, not a sequence: open it in the workbench with Open session',
  analysis: 'an analysis result of this program, not a sequence: analyse the file the result was made from',
  'analysis-set': 'a set of analysis results of this program, not a sequence: analyse the file the results were made from',
  part: 'a part file of a chunked run, not a sequence: combine the part files with returnrate merge PART...',
};

/**
 * A file this program wrote (a session, an analysis result, a part file) given as a sequence would be
 * read as JSON characters without complaint; this names it instead (ReadError 'not-a-sequence', one
 * line). Only regular files are looked at (a pipe cannot be read twice); `--format bytes` reads any
 * file on purpose and is left alone by the caller.
 */
export async function ownFileRefusal(path: string): Promise<ReadError | null> {
  let head: string;
  try {
    const handle = await open(path, 'r');
    try {
      const buffer = Buffer.alloc(HEAD_BYTES);
      const { bytesRead } = await handle.read(buffer, 0, HEAD_BYTES, 0);
      head = buffer.subarray(0, bytesRead).toString('utf8');
    } finally {
      await handle.close();
    }
  } catch {
    // The reader reports a file it cannot open with its own message.
    return null;
  }
  if (!/^\uFEFF?\s*\{/.test(head)) return null;
  const m = OWN_SCHEMA.exec(head);
  if (m === null) return null;
  const advice = ADVICE[m[1]!];
  if (advice === undefined) return null;
  return new ReadError('not-a-sequence', `${advice} (schema returnrate.${m[1]}/${m[2]})`);
}
