/** d! for d = 0..8. */
const FACTORIAL = [1, 1, 2, 6, 24, 120, 720, 5040, 40320];

/**
 * Ordinal patterns of order d with delay tau (Bandt & Pompe, Phys. Rev. Lett. 88 (2002) 174102):
 * the pattern at t is the argsort permutation pi of the window (x_t, x_{t+tau}, ...,
 * x_{t+(d-1)tau}), i.e. x_{t+pi_0 tau} <= x_{t+pi_1 tau} <= ... . Ties: of two equal values the one
 * that occurs earlier ranks lower (a stable sort). Each pattern is returned as the lexicographic
 * rank (Lehmer code) of pi among the d! permutations, so "01..(d-1)" (increasing) is 0 and the
 * decreasing pattern is d! - 1; `ordinalLabel` turns a rank back into its digits.
 * @returns one rank per window: values.length - (d-1) tau of them (none when the series is shorter)
 */
export function ordinalPatterns(values: Float64Array, order: number, delay: number): Int32Array {
  if (!(Number.isInteger(order) && order >= 2 && order < FACTORIAL.length)) throw new RangeError(`order must be an integer from 2 to ${FACTORIAL.length - 1}, got ${order}`);
  if (!(Number.isInteger(delay) && delay >= 1)) throw new RangeError(`delay must be an integer >= 1, got ${delay}`);
  const span = (order - 1) * delay;
  const count = Math.max(0, values.length - span);
  const ranks = new Int32Array(count);
  const perm = new Int32Array(order);
  for (let t = 0; t < count; t++) {
    // Insertion sort of the window's offsets by value; moving only past strictly larger values keeps
    // earlier offsets first among ties.
    for (let i = 0; i < order; i++) {
      const v = values[t + i * delay];
      let j = i;
      while (j > 0 && values[t + perm[j - 1] * delay] > v) {
        perm[j] = perm[j - 1];
        j--;
      }
      perm[j] = i;
    }
    let rank = 0;
    for (let i = 0; i < order; i++) {
      let smaller = 0;
      for (let j = i + 1; j < order; j++) if (perm[j] < perm[i]) smaller++;
      rank += smaller * FACTORIAL[order - 1 - i];
    }
    ranks[t] = rank;
  }
  return ranks;
}

/** The permutation with the given lexicographic rank, as its digits (e.g. order 3: 0 -> "012", 4 -> "201"). */
export function ordinalLabel(rank: number, order: number): string {
  if (!(Number.isInteger(rank) && rank >= 0 && rank < (FACTORIAL[order] ?? 0))) throw new RangeError(`rank ${rank} is not a permutation of order ${order}`);
  const left = Array.from({ length: order }, (_, i) => i);
  let r = rank;
  let label = '';
  for (let i = order - 1; i >= 0; i--) {
    const f = FACTORIAL[i];
    const index = Math.floor(r / f);
    r -= index * f;
    label += String(left.splice(index, 1)[0]);
  }
  return label;
}

/** Number of ordinal patterns of an order: order!. */
export function ordinalPatternCount(order: number): number {
  return FACTORIAL[order] ?? Infinity;
}
