import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';
import { createReader, type ReadResult, type ReaderOptions } from './sequenceReader';

/** A streaming reader that also hashes the bytes it is given (SHA-256, hex), for the result record. */
export interface DigestingReader {
  push(chunk: Uint8Array): void;
  finish(): ReadResult & { sha256: string };
}

/**
 * createReader plus an incremental SHA-256 of the same bytes: every host (the command line's file
 * stream, the worker's Blob stream) feeds chunks to one object and gets the sequence and the
 * checksum that identifies the input in saved analyses.
 */
export function createDigestingReader(options: ReaderOptions): DigestingReader {
  const reader = createReader(options);
  const hash = sha256.create();
  return {
    push(chunk) {
      hash.update(chunk);
      reader.push(chunk);
    },
    finish() {
      return { ...reader.finish(), sha256: bytesToHex(hash.digest()) };
    },
  };
}
