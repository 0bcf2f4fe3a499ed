import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { fmix32 } from './fmix32';

const TWO_POW_32 = 4294967296;
const TWO_POW_26 = 67108864;
const TWO_POW_MINUS_53 = 1 / 9007199254740992;

/**
 * A xoroshiro128+ generator (pure-rand) for a seed. pure-rand's own xoroshiro128plus(seed) puts the
 * seed into the state almost verbatim, so its first outputs for seeds 0, 1, 2, ... are nearly equal;
 * hashing every state word first makes consecutive seeds give unrelated streams (seeding from a
 * hash is what the generator's authors recommend, Blackman & Vigna 2018, from memory).
 * @param seed any safe integer (both 32-bit halves are used)
 * @throws RangeError when seed is not a safe integer
 */
export function seededRandom(seed: number): RandomGenerator {
  if (!Number.isSafeInteger(seed)) throw new RangeError(`seed must be a safe integer, got ${seed}`);
  const lo = seed >>> 0;
  const hi = Math.floor(seed / TWO_POW_32) | 0;
  const words = [0, 0, 0, 0];
  for (let k = 0; k < 4; k++) {
    words[k] = fmix32(lo ^ fmix32(hi + Math.imul(k + 1, 0x9e3779b9)));
  }
  if ((words[0] | words[1] | words[2] | words[3]) === 0) words[0] = 1;
  return xoroshiro128plusFromState(words);
}

/** Uniforms made per refill of a UniformStream's buffer. */
const BUFFER_SIZE = 1024;

/**
 * Uniform doubles in [0, 1), multiples of 2^-53, each from the high 27 and 26 bits of two 32-bit
 * outputs (the genrand_res53 construction of the Mersenne Twister reference code, Matsumoto &
 * Nishimura 1998, from memory). Not pure-rand's uniformFloat64, which keeps the low bits of each
 * output, and the lowest bits of xoroshiro128+ are its weak ones (Blackman & Vigna 2018, from
 * memory). Uniforms are made a buffer at a time in one loop, so the generator is called from a
 * single site: calling it from every source's hot loop made V8 slow down whichever loop was
 * compiled second (measured: 2x). The stream of values does not depend on the buffer size.
 */
export class UniformStream {
  private readonly buffer = new Float64Array(BUFFER_SIZE);
  private index = BUFFER_SIZE;
  private readonly rng: RandomGenerator;

  constructor(rng: RandomGenerator) {
    this.rng = rng;
  }

  /** The next uniform in [0, 1). */
  next(): number {
    if (this.index === BUFFER_SIZE) this.refill();
    return this.buffer[this.index++];
  }

  /** The next uniform mapped to (0, 1] as 1 - u, for inverse transforms with a log or negative power. */
  nextPositive(): number {
    return 1 - this.next();
  }

  private refill(): void {
    const rng = this.rng;
    const buffer = this.buffer;
    for (let k = 0; k < BUFFER_SIZE; k++) {
      const a = rng.next() >>> 5;
      const b = rng.next() >>> 6;
      buffer[k] = (a * TWO_POW_26 + b) * TWO_POW_MINUS_53;
    }
    this.index = 0;
  }
}

/** A UniformStream over seededRandom(seed). */
export function uniformStream(seed: number): UniformStream {
  return new UniformStream(seededRandom(seed));
}
