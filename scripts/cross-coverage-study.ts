/**
 * Coverage study of the cross entropy interval (not part of CI): for each pair of reference sources
 * with a closed-form cross entropy (crossReferenceOfSpecs: Rached, Alajaji & Campbell, IEEE Trans. IT
 * 50 (2004)), compare `--reps` independent pairs of length `--n` under several interval rules and
 * count how often the 95% interval holds the exact H(P, Q). Only the waiting-time part runs (not the
 * analysis of A alone), so the rules differ only in how the slope and its standard error are taken.
 *
 *   npx tsx scripts/cross-coverage-study.ts [--reps 40] [--n 100000] [--seed 1] [--rules a,b,...]
 *
 * Rules:
 *   pairsK        slope and interval over K segment pairs (the rule before this study had K = 32)
 *   wholeK        slope from A's waits in all of B (one pair, larger n reachable); standard error by
 *                 batch means over K segment pairs at the pairs' own trusted range, t on K - 1 df
 *   pairsKc       as pairsK with at most 0.1% censored waits in the trusted range (not 1%)
 *   pairsKw       as pairsK with the slope over the top four trusted levels (not two)
 *   sameK         slope from A's waits in all of B at the K pairs' trusted range (same n, fewer
 *                 censored waits); standard error from the K pairs
 */
import { pairedWaits, type PairedWaits } from '../src/core/cross/pairedWaits';
import { sharedAlphabet } from '../src/core/cross/sharedAlphabet';
import { crossReferenceOfSpecs } from '../src/core/cross/crossReferenceOfSpecs';
import { waitingMoments } from '../src/core/cross/waitingMoments';
import { waitingRange } from '../src/core/cross/waitingRange';
import { slopeOverLevels } from '../src/core/estimate/slopeOverLevels';
import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { parseSourceSpec } from '../src/core/sources/catalog';

const PAIRS: readonly (readonly [string, string])[] = [
  ['markov:0.9,0.1;0.4,0.6', 'markov:0.7,0.3;0.5,0.5'],
  ['bernoulli:0.3', 'bernoulli:0.5'],
  ['coin', 'coin'],
  ['bernoulli:0.3', 'bernoulli:0.3'],
];

interface Args {
  reps: number;
  n: number;
  seed: number;
  rules: string[];
}

function parseArgs(argv: readonly string[]): Args {
  const args: Args = { reps: 40, n: 100_000, seed: 1, rules: ['pairs32', 'pairs16', 'pairs8', 'whole32', 'whole16', 'whole8'] };
  for (let i = 0; i < argv.length; i += 2) {
    const key = argv[i];
    const value = argv[i + 1] ?? '';
    if (key === '--reps') args.reps = Number(value);
    else if (key === '--n') args.n = Number(value);
    else if (key === '--seed') args.seed = Number(value);
    else if (key === '--rules') args.rules = value.split(',');
    else throw new RangeError(`unknown option ${key}`);
  }
  return args;
}

const MAX_N = 40;
const CENSORED = 0.01;
const CONFIDENCE = 0.95;

interface Slope {
  estimate: number;
  se: number | null;
  df: number;
  hi: number;
}

function slopeOf(scan: PairedWaits, fixedHi?: number, censored = CENSORED, width = 2): Slope | null {
  const found = waitingRange(scan.levels, censored);
  const top = fixedHi ?? found.hi;
  const range = { lo: Math.max(1, top - width + 1), hi: top };
  if (range.hi < 2) return null;
  const moments = [];
  for (let n = range.lo; n <= range.hi; n++) {
    const level = scan.levels[n - 1];
    if (level !== undefined) moments.push(waitingMoments(level));
  }
  const { estimate, interval } = slopeOverLevels(moments, 'mean', CONFIDENCE);
  return { estimate, se: interval?.standardError ?? null, df: interval?.degreesOfFreedom ?? 0, hi: range.hi };
}

function main(): void {
  const args = parseArgs(process.argv.slice(2));
  const ks = new Set<number>();
  for (const r of args.rules) ks.add(Number(r.replace(/\D+/g, '')));
  console.log(`reps ${args.reps}, n ${args.n}, seed ${args.seed}; rules ${args.rules.join(', ')}`);
  const rows: string[] = [];
  for (let p = 0; p < PAIRS.length; p++) {
    const pair = PAIRS[p];
    if (pair === undefined) continue;
    const [specA, specB] = pair;
    const exact = crossReferenceOfSpecs(specA, specB);
    if (exact === null) throw new Error('no closed form');
    const H = exact.crossEntropyNats;
    const hits = new Map<string, number>();
    const zs = new Map<string, number[]>();
    const his = new Map<string, number[]>();
    for (const r of args.rules) {
      hits.set(r, 0);
      zs.set(r, []);
      his.set(r, []);
    }
    for (let rep = 0; rep < args.reps; rep++) {
      const seedA = args.seed * 1_000_003 + 1000 * p + 2 * rep + 1;
      const a = parseSourceSpec(specA).generate(args.n, seedA);
      const b = parseSourceSpec(specB).generate(args.n, seedA + 1);
      const shared = sharedAlphabet(a, b);
      const scans = new Map<number, PairedWaits>();
      for (const k of ks) {
        scans.set(k, pairedWaits(shared.symbolsA, shared.symbolsB, shared.alphabet.length, { maxN: Math.min(MAX_N, Math.floor(args.n / k)), pairs: k, sampleTarget: 1 }));
      }
      const ruleSlope = (r: string, K: number): Slope | null => {
        const scan = scans.get(K);
        if (scan === undefined) return null;
        return slopeOf(scan, undefined, r.endsWith('c') ? 0.001 : CENSORED, r.endsWith('w') ? 4 : 2);
      };
      const needWhole = args.rules.some((r) => r.startsWith('whole') || r.startsWith('same'));
      const wholeScan = needWhole
        ? pairedWaits(shared.symbolsA, shared.symbolsB, shared.alphabet.length, { maxN: MAX_N, pairs: 1, sampleTarget: 1 })
        : null;
      const whole = wholeScan === null ? null : slopeOf(wholeScan);
      for (const r of args.rules) {
        const K = Number(r.replace(/\D+/g, ''));
        const pairs = ruleSlope(r, K);
        let est: number | null = null;
        let se: number | null = null;
        let df = K - 1;
        let hi = 0;
        if (r.startsWith('pairs') && pairs !== null && pairs.se !== null) {
          est = pairs.estimate;
          se = pairs.se;
          df = pairs.df;
          hi = pairs.hi;
        } else if (r.startsWith('whole') && whole !== null && pairs !== null && pairs.se !== null) {
          est = whole.estimate;
          se = pairs.se;
          df = pairs.df;
          hi = whole.hi;
        }
        else if (r.startsWith('same') && wholeScan !== null && pairs !== null && pairs.se !== null) {
          est = slopeOf(wholeScan, pairs.hi)?.estimate ?? null;
          se = pairs.se;
          df = pairs.df;
          hi = pairs.hi;
        }
        if (est === null || se === null) continue;
        const q = tQuantile(0.5 + CONFIDENCE / 2, df);
        if (Math.abs(est - H) <= q * se) hits.set(r, (hits.get(r) ?? 0) + 1);
        zs.get(r)?.push((est - H) / se);
        his.get(r)?.push(hi);
      }
    }
    for (const r of args.rules) {
      const z = zs.get(r) ?? [];
      const meanZ = z.reduce((s, x) => s + x, 0) / Math.max(1, z.length);
      const sdZ = Math.sqrt(z.reduce((s, x) => s + (x - meanZ) ** 2, 0) / Math.max(1, z.length - 1));
      const h = his.get(r) ?? [];
      const meanHi = h.reduce((s, x) => s + x, 0) / Math.max(1, h.length);
      rows.push(
        `${specA} vs ${specB}\t${r}\t${hits.get(r)}/${args.reps}\tmean z ${meanZ.toFixed(2)}\tsd z ${sdZ.toFixed(2)}\tmean n_hi ${meanHi.toFixed(1)}`,
      );
      console.log(rows[rows.length - 1]);
    }
  }
}

main();
