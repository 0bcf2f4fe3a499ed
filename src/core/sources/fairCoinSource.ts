import type { Sequence } from '../sequence/sequence';
import type { DetailedSample, ReferenceSource } from './referenceSource';
import { seededRandom } from './seededRandom';
import { checkLength, sequenceFromSymbols } from './sequenceFromSymbols';

/** Bits taken from each 32-bit output: the high half, since the lowest bits of xoroshiro128+ are weak. */
const BITS_PER_DRAW = 16;

/**
 * Fair coin flips '0'/'1': h = log 2, sigma^2 = 0 (every n-block has probability 2^-n), so the
 * Gaussian limit is degenerate and R_n 2^-n tends to the exponential law instead.
 */
export function fairCoinSource(): ReferenceSource {
  const alphabet = ['0', '1'];
  const generate = (length: number, seed: number): Sequence => {
    checkLength(length);
    const rng = seededRandom(seed);
    const symbols = new Uint8Array(length);
    let t = 0;
    while (t < length) {
      let word = rng.next() >>> BITS_PER_DRAW;
      const end = Math.min(length, t + BITS_PER_DRAW);
      for (; t < end; t++) {
        symbols[t] = word & 1;
        word >>>= 1;
      }
    }
    return sequenceFromSymbols(symbols, alphabet);
  };
  const generateDetailed = (length: number, seed: number): DetailedSample => ({
    sequence: generate(length, seed),
    information: new Float64Array(length).fill(Math.LN2),
    warnings: [],
  });
  return {
    id: 'coin',
    label: 'Fair coin',
    facts: {
      entropyRate: Math.LN2,
      sigma2: 0,
      description:
        'Independent fair bits, 16 from the high half of each 32-bit xoroshiro128+ output. ' +
        'h = log 2 and sigma^2 = 0 exactly: every n-block has probability 2^-n, so return times ' +
        'follow the exponential law rather than a Gaussian one.',
      gaussianLimit: false,
    },
    generate,
    generateDetailed,
  };
}
