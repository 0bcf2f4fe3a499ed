import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';

/**
 * Hex SHA-256 of a file's bytes, streamed in chunks so a large file is never held whole; the same
 * hash as the worker's digesting reader (createDigestingReader) computes during a run.
 */
export async function fileSha256(file: Blob, signal?: AbortSignal): Promise<string> {
  const hash = sha256.create();
  const reader = file.stream().getReader();
  for (;;) {
    if (signal?.aborted === true) {
      await reader.cancel();
      throw new DOMException('cancelled', 'AbortError');
    }
    const { done, value } = await reader.read();
    if (done) break;
    hash.update(value);
  }
  return bytesToHex(hash.digest());
}
