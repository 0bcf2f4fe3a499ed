import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readInputFile } from '../../src/cli/readInput';
import { ReadError } from '../../src/core/sequence/readError';
import { readAll } from '../../src/core/sequence/sequenceReader';

const dir = mkdtempSync(join(tmpdir(), 'returnrate-readInput-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function file(name: string, content: string | Uint8Array): string {
  const path = join(dir, name);
  writeFileSync(path, content);
  return path;
}

function bytesOf(a: ArrayBufferView): Buffer {
  return Buffer.from(a.buffer, a.byteOffset, a.byteLength);
}

async function rejection(promise: Promise<unknown>): Promise<ReadError> {
  try {
    await promise;
  } catch (e) {
    if (e instanceof ReadError) return e;
    throw e;
  }
  throw new Error('expected a ReadError');
}

describe('readInputFile', () => {
  it('reads a small file and hashes it', async () => {
    const path = file('abc.txt', 'abc');
    const r = await readInputFile(path, { format: 'chars' });
    expect(r.sequence.alphabet).toEqual(['a', 'b', 'c']);
    // SHA-256("abc"): FIPS 180-2, appendix B.1 example.
    expect(r.sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(r.bytesRead).toBe(3);
  });

  it('streams a file of several 1 MiB chunks to the same result as reading it whole', async () => {
    // 3.5 MiB of FASTA with multi-byte header names, so chunk edges fall anywhere.
    const lines = ['>rec é1'];
    for (let i = 0, length = 0; length < 3.5 * 2 ** 20; i++) {
      const line = i % 500 === 499 ? `>rec ü${i}` : 'ACGTTGCAnacgtaGGCCTTAA-ACGTACGGTAC';
      lines.push(line);
      length += line.length + 1;
    }
    const bytes = new TextEncoder().encode(lines.join('\n'));
    const path = file('big.fa', bytes);
    const r = await readInputFile(path, { format: 'fasta' });
    const whole = readAll(bytes, { format: 'fasta' });
    // Typed arrays compared as bytes: vitest's element-wise deep equality is slow on millions of elements.
    expect(r.sequence.symbols.constructor).toBe(whole.sequence.symbols.constructor);
    expect(bytesOf(r.sequence.symbols).equals(bytesOf(whole.sequence.symbols))).toBe(true);
    expect(r.sequence.alphabet).toEqual(whole.sequence.alphabet);
    expect(r.records).toEqual(whole.records);
    expect(r.details).toEqual(whole.details);
    expect(r.bytesRead).toBe(bytes.length);
    // Node's own SHA-256 as an independent implementation.
    expect(r.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
  });

  it('refuses a missing file with code missing-file and the path', async () => {
    const path = join(dir, 'no-such-file.txt');
    const e = await rejection(readInputFile(path, { format: 'chars' }));
    expect(e.code).toBe('missing-file');
    expect(e.message).toContain(path);
  });

  it('refuses a directory with code unreadable-file', async () => {
    const e = await rejection(readInputFile(dir, { format: 'chars' }));
    expect(e.code).toBe('unreadable-file');
    expect(e.message).toContain(dir);
  });

  it('passes reader errors through with their position', async () => {
    const path = file('bad.csv', 'a,b\n1,2\n3\n');
    const e = await rejection(readInputFile(path, { format: 'csv', column: 'b' }));
    expect(e.code).toBe('short-row');
    expect(e.position).toEqual({ line: 3 });
  });
});
