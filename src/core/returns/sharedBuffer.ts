import type { SymbolArray } from '../sequence/sequence';

/**
 * Memory that every thread of a shared scan can read without a copy: a SharedArrayBuffer where the
 * host has one (Node, cross-origin isolated pages), else a plain buffer (then copied per message).
 */
/** Whether an array lives in shared memory (then threads read it in place). */
export function isShared(array: ArrayBufferView): boolean {
  return typeof SharedArrayBuffer !== 'undefined' && array.buffer instanceof SharedArrayBuffer;
}

export function sharedBuffer(bytes: number): ArrayBuffer | SharedArrayBuffer {
  return typeof SharedArrayBuffer === 'undefined' ? new ArrayBuffer(bytes) : new SharedArrayBuffer(bytes);
}

/** The symbols in a SharedArrayBuffer, so that every thread of a shared scan reads the one copy: as
 * they are when the reader wrote them there (ReaderOptions.sharedMemory), else copied. */
export function sharedSymbols(symbols: SymbolArray): SymbolArray {
  if (isShared(symbols)) return symbols;
  const copy = new (symbols.constructor as new (b: SharedArrayBuffer) => SymbolArray)(new SharedArrayBuffer(symbols.byteLength));
  copy.set(symbols);
  return copy;
}
