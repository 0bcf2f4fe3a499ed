import { describe, expect, it } from 'vitest';
import { adviseMemory, estimatePeakMemory } from '../../../src/core/returns/memoryEstimate';
import { PAGE_MEMORY_BUDGET_BYTES, pageMemoryCheck } from '../../../src/core/returns/pageMemoryCheck';

// The workbench's memory check, run without a browser (the worker calls this function before the scan).

describe('pageMemoryCheck', () => {
  it('takes 10^8 binary symbols within the fixed 4 GiB', () => {
    // 1e8 x (1 + 12) bytes + 64 MiB + small arrays: about 1.37 GB, by hand from memoryEstimate.ts.
    expect(PAGE_MEMORY_BUDGET_BYTES).toBe(4 * 2 ** 30);
    expect(() => pageMemoryCheck({ symbols: 1e8, alphabetSize: 2, maxN: 40 })).not.toThrow();
  });

  it('refuses 5 x 10^8 binary symbols and names a chunk size of the command line that fits', () => {
    // 5e8 x 13 bytes = 6.5 GB > 4.29 GB; a chunk of c positions adds 12 c bytes to 5e8 + 64 MiB + small.
    const input = { symbols: 5e8, alphabetSize: 2, maxN: 40 };
    let message = '';
    try {
      pageMemoryCheck(input);
    } catch (e) {
      expect(e).toBeInstanceOf(RangeError);
      message = (e as Error).message;
    }
    const chunk = Number(/returnrate analyze FILE --chunk (\d+)\)$/.exec(message)?.[1]);
    expect(message).toMatch(/^this run needs about 6\.\d GB of memory, more than the page's 4\.3 GB \(a fixed budget\); the command line can run it in chunks/);
    // The named chunk fits and one more step of 2^16 positions would not: it is the largest that fits.
    expect(chunk % 65536).toBe(0);
    expect(estimatePeakMemory({ ...input, chunkSize: chunk }).totalBytes).toBeLessThanOrEqual(PAGE_MEMORY_BUDGET_BYTES);
    expect(estimatePeakMemory({ ...input, chunkSize: chunk + 65536 }).totalBytes).toBeGreaterThan(PAGE_MEMORY_BUDGET_BYTES);
  });

  it('names the least memory when even the smallest chunk does not fit', () => {
    // 4.25e9 symbols of 1 byte alone exceed 4 GiB - 64 MiB = 4.23e9 bytes.
    const input = { symbols: 4.25e9, alphabetSize: 2, maxN: 40 };
    expect(adviseMemory(input, PAGE_MEMORY_BUDGET_BYTES).kind).toBe('too-large');
    expect(() => pageMemoryCheck(input)).toThrow(/more than the page's 4\.3 GB \(a fixed budget\); the command line can run it where it has about 4\.\d GB, the smallest chunked run \(--chunk 65536\)$/);
  });
});
