import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/**
 * A two-state Markov chain path from a seeded pure-rand generator, written as tokens 'a'/'b'
 * separated by spaces, 50 per line. With spaces between single characters the file reads the same
 * as tokens or as characters, so the comparison with the command line does not hinge on its
 * default format.
 * @param stay probability of staying in each state, e.g. [0.9, 0.6]
 */
export function twoStateChainText(length: number, stay: readonly [number, number], seed: number): string {
  const rng = xoroshiro128plus(seed);
  const labels = ['a', 'b'];
  const lines: string[] = [];
  let line: string[] = [];
  let state = 0;
  for (let t = 0; t < length; t++) {
    line.push(labels[state] ?? 'a');
    if (line.length === 50) {
      lines.push(line.join(' '));
      line = [];
    }
    if (uniformFloat64(rng) >= (stay[state] ?? 0)) state = 1 - state;
  }
  if (line.length > 0) lines.push(line.join(' '));
  return `${lines.join('\n')}\n`;
}
