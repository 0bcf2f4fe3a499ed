/**
 * MurmurHash3's 32-bit finalizer (Appleby, from memory): a bijection on 32-bit words with full
 * avalanche, used to spread small seeds. Returns a signed 32-bit integer; `>>> 0` makes it unsigned.
 */
export function fmix32(x: number): number {
  let h = x | 0;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h | 0;
}
