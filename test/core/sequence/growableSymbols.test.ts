import { describe, expect, it } from 'vitest';
import { GrowableSymbols } from '../../../src/core/sequence/growableSymbols';
import { ReadError } from '../../../src/core/sequence/readError';
import { createReader } from '../../../src/core/sequence/sequenceReader';

function filled(ids: readonly number[], capacity?: number): GrowableSymbols {
  const g = new GrowableSymbols(capacity);
  for (const id of ids) g.push(id);
  return g;
}

describe('GrowableSymbols', () => {
  it('stays a Uint8Array while ids are below 256', () => {
    const a = filled([0, 255, 7]).toSymbolArray();
    expect(a).toBeInstanceOf(Uint8Array);
    expect(Array.from(a)).toEqual([0, 255, 7]);
  });

  it('widens to Uint16Array at id 256 and to Int32Array at id 65536, keeping earlier symbols', () => {
    // Bounds of the element types: 2^8 and 2^16 (common practice, no source).
    const g = filled([3, 255]);
    g.push(256);
    const mid = g.toSymbolArray();
    expect(mid).toBeInstanceOf(Uint16Array);
    expect(Array.from(mid)).toEqual([3, 255, 256]);
    g.push(65536);
    const wide = g.toSymbolArray();
    expect(wide).toBeInstanceOf(Int32Array);
    expect(Array.from(wide)).toEqual([3, 255, 256, 65536]);
  });

  it('jumps straight to Int32Array when the first wide id is past 65535', () => {
    const a = filled([1, 70000]).toSymbolArray();
    expect(a).toBeInstanceOf(Int32Array);
    expect(Array.from(a)).toEqual([1, 70000]);
  });

  it('uses an exact capacity without reallocating', () => {
    const a = filled([1, 2, 3, 4, 5], 5).toSymbolArray();
    expect(a.length).toBe(5);
    expect(a.buffer.byteLength).toBe(5);
  });

  it('grows by doubling past a small capacity', () => {
    const ids = Array.from({ length: 5000 }, (_, i) => i % 200);
    expect(Array.from(filled(ids, 3).toSymbolArray())).toEqual(ids);
  });

  it('trims with a copy when more than an eighth of the buffer is unused, with a view otherwise', () => {
    const copied = filled([1, 2], 100).toSymbolArray();
    expect(copied.buffer.byteLength).toBe(2);
    const viewed = filled(Array.from({ length: 95 }, () => 1), 100).toSymbolArray();
    expect(viewed.length).toBe(95);
    expect(viewed.buffer.byteLength).toBe(100);
  });

  it('keeps the symbols in shared memory through growth, widening and trimming when asked to', () => {
    // API contract (ReaderOptions.sharedMemory): worker threads read the array in place.
    const g = new GrowableSymbols(4, Infinity, true);
    for (let i = 0; i < 40; i++) g.push(i % 3);
    expect(g.toSymbolArray().buffer).toBeInstanceOf(SharedArrayBuffer);
    const wide = new GrowableSymbols(100, Infinity, true);
    wide.push(1);
    wide.push(70_000);
    const trimmed = wide.toSymbolArray();
    expect(trimmed).toBeInstanceOf(Int32Array);
    expect(Array.from(trimmed)).toEqual([1, 70_000]);
    expect(trimmed.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(filled([1, 2], 100).toSymbolArray().buffer).toBeInstanceOf(ArrayBuffer);
    const reader = createReader({ format: 'chars', sharedMemory: true, sizeHint: 6 });
    reader.push(new TextEncoder().encode('abcab\n'));
    const read = reader.finish();
    expect(read.sequence.symbols.buffer).toBeInstanceOf(SharedArrayBuffer);
    expect(Array.from(read.sequence.symbols)).toEqual([0, 1, 2, 0, 1]);
  });

  it('refuses more than maxLength symbols', () => {
    const g = new GrowableSymbols(10, 3);
    g.push(0);
    g.push(0);
    g.push(0);
    let error: unknown;
    try {
      g.push(0);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ReadError);
    expect((error as ReadError).code).toBe('too-many-symbols');
  });
});
