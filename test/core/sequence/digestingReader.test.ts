import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { createDigestingReader } from '../../../src/core/sequence/digestingReader';
import { readAll } from '../../../src/core/sequence/sequenceReader';

describe('createDigestingReader', () => {
  it('reads like readAll and hashes the same bytes as node:crypto, whatever the chunking', () => {
    // source: node:crypto SHA-256 as an independent oracle (common practice, no source)
    const bytes = new TextEncoder().encode('N NE E SE\nS SW W NW\n'.repeat(500));
    const reader = createDigestingReader({ format: 'tokens' });
    for (let i = 0; i < bytes.length; i += 777) reader.push(bytes.subarray(i, i + 777));
    const result = reader.finish();
    expect(result.sha256).toBe(createHash('sha256').update(bytes).digest('hex'));
    expect(Array.from(result.sequence.symbols)).toEqual(Array.from(readAll(bytes, { format: 'tokens' }).sequence.symbols));
  });
});
