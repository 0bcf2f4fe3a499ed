import { continuedFractionSource } from './continuedFractionSource';
import { fairCoinSource } from './fairCoinSource';
import { iidSource } from './iidSource';
import { markovSource } from './markovSource';
import { goldenMeanSource, parrySource } from './parrySource';
import type { ReferenceSource } from './referenceSource';
import { renewalSource } from './renewalSource';

/**
 * Ready-made reference sources, each with its exact h and sigma^2 (or an honest null): the fair
 * coin, Bernoulli(0.3), the two-state and three-state chains of THEORY.md section 2, the golden-mean
 * Parry measure, continued-fraction digits, and the renewal process with gap tail exponent 2.5
 * (finite gap variance: slow, polynomial mixing, but sigma^2 and the intervals' central limit hold)
 * and 1.5 (infinite gap variance: the Gaussian limit fails, the case that shows it). Every id is a
 * spec that parseSourceSpec turns back into the same source.
 */
export function sourceCatalog(): ReferenceSource[] {
  const twoState = markovSource([
    [0.9, 0.1],
    [0.4, 0.6],
  ]);
  const threeState = markovSource([
    [0.5, 0.3, 0.2],
    [0.2, 0.6, 0.2],
    [0.1, 0.2, 0.7],
  ]);
  return [
    fairCoinSource(),
    iidSource([0.7, 0.3]),
    { ...twoState, label: 'Sticky two-state chain [[0.9, 0.1], [0.4, 0.6]]' },
    { ...threeState, label: 'Three-state chain [[.5, .3, .2], [.2, .6, .2], [.1, .2, .7]]' },
    goldenMeanSource(),
    continuedFractionSource(),
    renewalSource(2.5),
    renewalSource(1.5),
  ];
}

/** The spec forms parseSourceSpec accepts, for help texts and error messages. */
export const SOURCE_SPEC_FORMS: readonly string[] = [
  'coin',
  'bernoulli:P',
  'iid:P0,P1,...',
  'markov:ROW;ROW;... (rows of comma-separated probabilities)',
  'markovK:ROW;... (order K >= 1, A^K rows, context = last K symbols in base A, most recent last)',
  'golden',
  'parry:ROW;ROW;... (0/1 adjacency)',
  'cf',
  'renewal[:ALPHA] (gap tail exponent, default 1.5)',
];

const ORDER_PATTERN = /^markov(\d+)$/;
const NUMBER_PATTERN = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

function parseNumber(text: string, where: string): number {
  const t = text.trim();
  if (!NUMBER_PATTERN.test(t)) throw new RangeError(`${where}: "${text}" is not a number`);
  return Number(t);
}

function parseList(text: string, where: string): number[] {
  if (text.trim() === '') throw new RangeError(`${where}: empty list`);
  return text.split(',').map((part, k) => parseNumber(part, `${where}, entry ${k + 1}`));
}

function parseRows(text: string, where: string): number[][] {
  return text.split(';').map((row, i) => parseList(row, `${where}, row ${i + 1}`));
}

function withContext<T>(spec: string, build: () => T): T {
  try {
    return build();
  } catch (e) {
    if (e instanceof RangeError) throw new RangeError(`source "${spec}": ${e.message}`, { cause: e });
    throw e;
  }
}

/**
 * A reference source from a one-line spec, as typed on the command line: `coin`, `bernoulli:0.3`,
 * `iid:0.3,0.7`, `markov:0.9,0.1;0.4,0.6` (rows separated by ';'), `markov2:...` (order 2, A^2
 * rows), `golden`, `parry:1,1;1,0`, `cf`, `renewal:1.5` (or `renewal` for 1.5). Names are
 * case-insensitive; spaces around parts are ignored.
 * @throws RangeError naming the bad part of the spec
 */
export function parseSourceSpec(spec: string): ReferenceSource {
  const trimmed = spec.trim();
  const colon = trimmed.indexOf(':');
  const name = (colon < 0 ? trimmed : trimmed.slice(0, colon)).trim().toLowerCase();
  const argument = colon < 0 ? null : trimmed.slice(colon + 1);
  const needsArgument = (what: string): string => {
    if (argument === null || argument.trim() === '') {
      throw new RangeError(`"${name}" needs ${what} after a colon`);
    }
    return argument;
  };
  const noArgument = (): void => {
    if (argument !== null) throw new RangeError(`"${name}" takes no parameters`);
  };
  return withContext(spec, () => {
    switch (name) {
      case 'coin':
        noArgument();
        return fairCoinSource();
      case 'bernoulli': {
        const p = parseNumber(needsArgument('a probability'), 'bernoulli');
        if (!(p >= 0 && p <= 1)) throw new RangeError(`bernoulli: probability ${p} is not in [0, 1]`);
        return iidSource([1 - p, p]);
      }
      case 'iid':
        return iidSource(parseList(needsArgument('probabilities'), 'iid'));
      case 'markov':
        return markovSource(parseRows(needsArgument('matrix rows'), 'markov'));
      case 'golden':
        noArgument();
        return goldenMeanSource();
      case 'parry':
        return parrySource(parseRows(needsArgument('adjacency rows'), 'parry'));
      case 'cf':
        noArgument();
        return continuedFractionSource();
      case 'renewal':
        return renewalSource(argument === null ? 1.5 : parseNumber(argument, 'renewal'));
      default: {
        const order = ORDER_PATTERN.exec(name);
        if (order !== null) {
          const k = Number(order[1]);
          return markovSource(parseRows(needsArgument('matrix rows'), name), k);
        }
        throw new RangeError(`unknown source "${name}"; expected one of: ${SOURCE_SPEC_FORMS.join(', ')}`);
      }
    }
  });
}
