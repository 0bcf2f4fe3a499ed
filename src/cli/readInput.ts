import { createReadStream } from 'node:fs';
import { stat } from 'node:fs/promises';
import { ReadError, createDigestingReader } from '../core';
import type { ReadResult, ReaderOptions } from '../core';
import { ownFileRefusal } from './ownFileRefusal';

/** Bytes per read from disk; the reader takes any chunk size, 1 MiB keeps calls few and memory flat. */
const CHUNK_BYTES = 1 << 20;

/**
 * Reads a file from disk with the core reader, streaming it in 1 MiB chunks so that the whole file
 * never sits in memory as one string, and hashes the same bytes (SHA-256, hex) for the analysis
 * record. The size of a regular file (fs.stat) becomes the reader's sizeHint unless options give
 * one; pipes and devices are read without one.
 * A missing path is ReadError 'missing-file', a directory or an unreadable file 'unreadable-file';
 * both messages name the path.
 */
export async function readInputFile(path: string, options: ReaderOptions): Promise<ReadResult & { sha256: string }> {
  let size: number | undefined;
  try {
    const info = await stat(path);
    if (info.isDirectory()) throw new ReadError('unreadable-file', `${path}: a directory, not a file`);
    // Pipes and devices (e.g. /dev/stdin, <(zcat x.gz)) stream fine but have no size.
    if (info.isFile()) size = info.size;
  } catch (e) {
    throw fileError(e, path);
  }
  if (size !== undefined && options.format !== 'bytes') {
    const own = await ownFileRefusal(path);
    if (own !== null) throw own;
  }
  const reader = createDigestingReader(options.sizeHint === undefined && size !== undefined ? { ...options, sizeHint: size } : options);
  try {
    for await (const chunk of createReadStream(path, { highWaterMark: CHUNK_BYTES })) reader.push(chunk as Buffer);
  } catch (e) {
    throw fileError(e, path);
  }
  return reader.finish();
}

/** Node's file errors as ReadError with the path; everything else unchanged. */
function fileError(e: unknown, path: string): unknown {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  if (code === 'ENOENT' || code === 'ENOTDIR') return new ReadError('missing-file', `${path}: no such file`);
  if (code === 'EACCES' || code === 'EPERM' || code === 'EISDIR') return new ReadError('unreadable-file', `${path}: cannot be read (${code})`);
  return e;
}
