/**
 * Memory that every thread of a shared scan can read without a copy: a SharedArrayBuffer where the
 * host has one (Node, cross-origin isolated pages), else a plain buffer (then copied per message).
 */
export function sharedBuffer(bytes: number): ArrayBuffer | SharedArrayBuffer {
  return typeof SharedArrayBuffer === 'undefined' ? new ArrayBuffer(bytes) : new SharedArrayBuffer(bytes);
}
