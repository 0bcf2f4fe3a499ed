import { createWriteStream } from 'node:fs';
import { once } from 'node:events';
import type { Writable } from 'node:stream';
import { finished } from 'node:stream/promises';

/** An output file cannot be written; printed as one line naming the path. */
export class OutputError extends Error {
  override readonly name = 'OutputError';
}

/** Streamed text output with back-pressure; every failure arrives as a rejected OutputError. */
export interface Output {
  /** Resolves once the destination can take more (after 'drain' when its buffer is full). */
  write(chunk: string): Promise<void>;
  /** Ends a file and resolves when its bytes are flushed; standard output is left open. */
  close(): Promise<void>;
}

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'its folder does not exist',
  ENOTDIR: 'its folder does not exist',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EISDIR: 'it is a directory',
  EROFS: 'read-only file system',
  ENOSPC: 'no space left on the device',
};

function outputError(path: string, e: unknown): OutputError {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  const reason = code === undefined ? String((e as Error | null)?.message ?? e) : `${REASONS[code] ?? 'write failed'}, ${code}`;
  return new OutputError(`${path}: cannot write (${reason})`, { cause: e });
}

/**
 * Where a command writes: `stdout` for '-', else a new file at `path`. A file's open and write
 * errors (missing folder, permissions, full disk) are caught from the first moment: a write stream
 * reports them as 'error' events after the call that caused them, and without a listener Node would
 * crash with a stack trace, or, once `end()` is under way, the error would be lost and a file
 * reported as written that never was.
 */
export function openOutput(path: string, stdout: Writable): Output {
  const toStdout = path === '-';
  const stream: Writable = toStdout ? stdout : createWriteStream(path);
  let failure: OutputError | null = null;
  const onError = (e: unknown): void => {
    failure ??= outputError(toStdout ? 'standard output' : path, e);
  };
  stream.on('error', onError);
  const drained = async (): Promise<void> => {
    // events.once rejects when 'error' fires first, so a failure never leaves this waiting.
    try {
      await once(stream, 'drain');
    } catch (e) {
      onError(e);
    }
    if (failure !== null) throw failure;
  };
  return {
    async write(chunk) {
      if (failure !== null) throw failure;
      if (!stream.write(chunk)) await drained();
    },
    async close() {
      if (failure !== null) throw failure;
      if (toStdout) {
        stream.off('error', onError);
        return;
      }
      stream.end();
      // finished() waits for 'close' (the descriptor released, so a caller may read the file next)
      // and rejects on an error, also one that came before it was called.
      try {
        await finished(stream);
      } catch (e) {
        onError(e);
      }
      if (failure !== null) throw failure;
    },
  };
}
