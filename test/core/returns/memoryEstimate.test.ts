import { describe, expect, it } from 'vitest';
import { adviseMemory, bytesPerSymbolId, engineBytesPerPosition, estimatePeakMemory, formatBytes, memoryAdviceMessage } from '../../../src/core/returns/memoryEstimate';
import { allocateSymbols } from '../../../src/core/sequence/sequence';

// Check values: the sizes scanReturns allocates per position (two Int32Array order arrays, two
// Uint16Array carried-word arrays for alphabets up to 256, else one scratch symbol array) and the
// element size of allocateSymbols; read from the code, common practice, no source.
describe('estimatePeakMemory', () => {
  it('counts the engine arrays scanReturns allocates per position', () => {
    expect(engineBytesPerPosition(2)).toBe(2 * Int32Array.BYTES_PER_ELEMENT + 2 * Uint16Array.BYTES_PER_ELEMENT);
    expect(engineBytesPerPosition(256)).toBe(12);
    expect(engineBytesPerPosition(257)).toBe(8 + allocateSymbols(1, 257).BYTES_PER_ELEMENT);
    expect(engineBytesPerPosition(70000)).toBe(8 + allocateSymbols(1, 70000).BYTES_PER_ELEMENT);
    for (const a of [2, 256, 257, 65536, 65537]) expect(bytesPerSymbolId(a)).toBe(allocateSymbols(1, a).BYTES_PER_ELEMENT);
  });

  it('adds symbols, one scan (or one chunk), the small per-level arrays and the base', () => {
    const e = estimatePeakMemory({ symbols: 1e8, alphabetSize: 2, maxN: 40, baseBytes: 0 });
    expect(e.symbolsBytes).toBe(1e8);
    expect(e.engineBytes).toBe(12e8);
    // per level: histogram floor(64 ln 1e8) + 2 = 1180 bins, 2 x 4 arrays of ceil(1e8 / 2^19) = 191 batches
    expect(e.smallBytes).toBe(40 * (1180 + 8 * 191) * 8 + 256 * 40 * 16 + 2 * 96);
    expect(e.totalBytes / 1e8).toBeCloseTo(13.0, 1);
    // chunks of 1e7 rounded up to the batch grid (2^19): 10,485,760 each, 9 of them, the last taking
    // the remainder 1e8 - 8 x 10,485,760 = 16,113,920; the arrays hold that longest chunk
    const chunked = estimatePeakMemory({ symbols: 1e8, alphabetSize: 2, maxN: 40, chunkSize: 1e7, baseBytes: 0 });
    expect(chunked.engineBytes).toBe(12 * 16_113_920);
    expect(chunked.symbolsBytes).toBe(1e8);
    // the running merge and one part of level sums instead of one scan's
    expect(chunked.smallBytes - e.smallBytes).toBe(40 * (1180 + 8 * 191) * 8);
    // two threads: a shared copy of the symbols; shared carried words (2 bytes) and the ranges'
    // layout (4 + 2 bytes) per position; 3/8 of one scan's arrays (12 * 3/8 bytes) in the threads;
    // and a 16 MiB V8 instance per thread
    const two = estimatePeakMemory({ symbols: 1e8, alphabetSize: 2, maxN: 40, threads: 2, baseBytes: 0 });
    expect(two.symbolsBytes).toBe(2e8);
    expect(two.engineBytes).toBe(12.5e8);
    expect(two.smallBytes - e.smallBytes).toBe(40 * (1180 + 8 * 191) * 8 + 2 * 16 * 2 ** 20);
    // a chunked run on two threads: the shared copy, and one chunk's scan (12 bytes a position) per thread
    const chunkedTwo = estimatePeakMemory({ symbols: 1e8, alphabetSize: 2, maxN: 40, chunkSize: 1e7, threads: 2, baseBytes: 0 });
    expect(chunkedTwo.symbolsBytes).toBe(2e8);
    expect(chunkedTwo.engineBytes).toBe(2 * 12 * 16_113_920);
    // symbols read straight into shared memory: no copy for the threads
    expect(estimatePeakMemory({ symbols: 1e8, alphabetSize: 2, maxN: 40, threads: 2, symbolsShared: true, baseBytes: 0 }).symbolsBytes).toBe(1e8);
  });

  it('advises a chunk that fits when every thread holds one', () => {
    // API contract (adviseMemory): the chunked run on two threads stays within the budget.
    const input = { symbols: 1e8, alphabetSize: 2, maxN: 40, threads: 2 };
    const advice = adviseMemory(input, 1e9);
    expect(advice.kind).toBe('chunk');
    if (advice.kind !== 'chunk') return;
    expect(advice.chunkEstimate.totalBytes).toBeLessThanOrEqual(1e9);
    expect(estimatePeakMemory({ ...input, chunkSize: advice.chunkSize + 65536 }).totalBytes).toBeGreaterThan(1e9);
  });

  it('advises the largest chunk (a multiple of 2^16) that fits, or nothing when the symbols alone do not', () => {
    const input = { symbols: 1e8, alphabetSize: 2, maxN: 40 };
    const budget = 1e9;
    const advice = adviseMemory(input, budget);
    expect(advice.kind).toBe('chunk');
    if (advice.kind !== 'chunk') return;
    expect(advice.chunkSize % 65536).toBe(0);
    expect(advice.chunkEstimate.totalBytes).toBeLessThanOrEqual(budget);
    expect(estimatePeakMemory({ ...input, chunkSize: advice.chunkSize + 65536 }).totalBytes).toBeGreaterThan(budget);
    expect(memoryAdviceMessage(advice, budget, '--max-memory')).toBe(
      `this run needs about ${formatBytes(advice.estimate.totalBytes)} but 1.0 GB are available (--max-memory); a chunked run fits: --chunk ${advice.chunkSize} (about ${formatBytes(advice.chunkEstimate.totalBytes)}; returns are then censored at chunk ends)`,
    );
    expect(memoryAdviceMessage(advice, budget, 'a fixed budget', 'page')).toBe(
      `this run needs about ${formatBytes(advice.estimate.totalBytes)} of memory, more than the page's 1.0 GB (a fixed budget); the command line can run it in chunks (returnrate analyze FILE --chunk ${advice.chunkSize})`,
    );
    expect(adviseMemory(input, 2e9).kind).toBe('fits');
    expect(adviseMemory(input, 1.5e8).kind).toBe('too-large');
    expect(formatBytes(1.37e9)).toBe('1.4 GB');
  });
});
