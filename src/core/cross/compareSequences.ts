import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { analyzeSequence, validateSettings } from '../analyze';
import { INTERVAL_BATCHES } from '../estimate/batchMeans';
import type { LevelBatchMoments } from '../estimate/levelBatchMoments';
import { normalizedFluctuations } from '../estimate/normalizedFluctuations';
import { slopeOverLevels } from '../estimate/slopeOverLevels';
import { entropyFactor, rateUnitLabel } from '../estimate/units';
import type { AnalysisSettings, AnalysisWarning } from '../result/analysisResult';
import { PROGRAM_VERSION } from '../result/version';
import type { Sequence } from '../sequence/sequence';
import {
  COMPARISON_SCHEMA,
  type ComparisonExact,
  type ComparisonFluctuations,
  type ComparisonInput,
  type ComparisonResult,
  type ComparisonRow,
  type RateEstimate,
} from './comparisonResult';
import { pairedWaits, type PairedWaits } from './pairedWaits';
import { sharedAlphabet } from './sharedAlphabet';
import { momentsOf, waitingMoments } from './waitingMoments';
import { waitingRange } from './waitingRange';

/** Exact values of the pair in nats (from markovCrossFacts), when both come from reference chains. */
export interface CrossReferenceFacts {
  readonly source: string;
  readonly crossEntropyNats: number;
  readonly entropyANats: number;
  readonly relativeEntropyNats: number;
  readonly sigma2CrossNats: number | null;
}

/** Progress, cancellation and reference facts for compareSequences. */
export interface ComparisonHooks {
  /** Called after each block length: first the analysis of A alone, then the waits of A in B. */
  readonly onLevel?: (stage: 'entropy-a' | 'waiting', n: number, maxN: number) => void;
  /** Polled during both scans; true abandons the comparison with ScanCancelled. */
  readonly shouldStop?: () => boolean;
  readonly exact?: CrossReferenceFacts;
  /** About this many sampled positions of A for the fluctuation view; default 1024. */
  readonly sampleTarget?: number;
  /** Segment pairs for the intervals (pairedWaits.ts); default pairCount(|A|, |B|). */
  readonly pairs?: number;
}

/** Shortest segment (symbols) a pair may have; shorter inputs get fewer pairs. */
export const MIN_PAIR_LENGTH = 512;

/**
 * Segment pairs by default. 8 rather than the return-time engine's 32 batches: longer B segments
 * let the trusted range reach larger n (about 12 instead of 9.5 for the chain pair at 1e5), where
 * the negative drift of E log W_n - n H is smaller; with the four-level slope (waitingRange.ts) this
 * gave the 95% coverage closest to 0.95 over the validation pairs (scripts/cross-coverage-study.ts,
 * 3 x 40 replicates per pair at 1e5: 429/480 against 398/480 for 32 pairs and two levels;
 * DEVELOPERS.md has the table). The interval uses t on K - 1 = 7 degrees of freedom, which keeps it
 * honest with few pairs.
 */
export const COMPARISON_PAIRS = 8;

/**
 * Default number of segment pairs: COMPARISON_PAIRS (8), fewer when a segment of the shorter input
 * would be below MIN_PAIR_LENGTH, at least 1 (then there is no interval).
 */
export function pairCount(lengthA: number, lengthB: number): number {
  return Math.max(1, Math.min(COMPARISON_PAIRS, Math.floor(Math.min(lengthA, lengthB) / MIN_PAIR_LENGTH)));
}

/** Input facts the host knows; symbol and alphabet counts are taken from the sequence. */
export type ComparisonInputFacts = Omit<ComparisonInput, 'symbols' | 'alphabetSize'>;

/** Fewer symbols in B than this get a 'short-b' warning. */
const SHORT_B = 1000;

/**
 * Cross entropy rate H(P_A, Q_B) and relative entropy rate D(P_A || Q_B) of two sequences from the
 * waiting times W_n(i) of A's n-blocks in B: (1/n) log W_n -> H(P, Q) almost surely (Wyner & Ziv,
 * IEEE Trans. IT 35 (1989), from memory; Kontoyiannis, J. Theoret. Probab. 11 (1998) 795-811, who
 * also gives the central limit theorem of log W_n around -log Q(A_1^n) with
 * sigma^2 = lim Var_P(-log Q(X_1^n))/n).
 *
 * - Waits are taken pair by pair: A's g-th segment waits in B's g-th segment (pairedWaits.ts
 *   says why: one shared B puts a common B-dependent error into every batch of A).
 * - Cross entropy: least-squares slope of mean log W_n against n over the trusted range
 *   (waitingRange.ts), which cancels the constant offset E log W_n - n H; interval by batch means
 *   over the pairs (the slope per pair; Schmeiser 1982), which see the variation of A and of B.
 * - h(A): the headline of the return-time analysis of A alone (analyze.ts).
 * - Relative entropy: D = cross - h(A). Both are computed from the same A, so they are dependent;
 *   whatever their correlation, SD(X - Y) <= SD(X) + SD(Y), so the standard errors are added (a
 *   conservative rule) and the interval is D +- t SE with the smaller degrees of freedom.
 * - sigma^2 of the cross information: slope of Var(log W_n) against n (a heuristic like the
 *   return-time variance growth; no interval).
 * @throws RangeError for invalid settings or inputs; ScanCancelled when hooks.shouldStop returns true
 */
export function compareSequences(
  a: Sequence,
  b: Sequence,
  inputA: ComparisonInputFacts,
  inputB: ComparisonInputFacts,
  settings: AnalysisSettings,
  hooks: ComparisonHooks = {},
): ComparisonResult {
  const N = a.symbols.length;
  const M = b.symbols.length;
  if (N < 2) throw new RangeError(`sequence A needs at least 2 symbols; got ${N}`);
  if (M < 1) throw new RangeError('sequence B is empty');
  validateSettings(settings, N);
  const { confidence } = settings;
  const K = hooks.pairs ?? pairCount(N, M);
  // Each pair's A segment must hold an n-block for every n scanned.
  const maxN = Math.min(settings.maxN, Math.floor(N / K));
  const f = entropyFactor(settings.unit);
  const shared = sharedAlphabet(a, b);
  const stop = hooks.shouldStop;

  const analysis = analyzeSequence(
    a,
    { name: inputA.name, sha256: inputA.sha256, format: inputA.format },
    { ...settings, unit: 'nat' },
    {
      ...(hooks.onLevel === undefined ? {} : { onLevel: (n: number) => hooks.onLevel?.('entropy-a', n, maxN) }),
      ...(stop === undefined ? {} : { shouldStop: stop }),
      pathSamples: 16,
    },
  );
  const scan = pairedWaits(shared.symbolsA, shared.symbolsB, shared.alphabet.length, {
    maxN,
    pairs: K,
    sampleTarget: hooks.sampleTarget ?? 1024,
    ...(hooks.onLevel === undefined ? {} : { onPair: (done, total) => hooks.onLevel?.('waiting', done, total) }),
    ...(stop === undefined ? {} : { shouldStop: stop }),
  });

  const warnings: AnalysisWarning[] = [];
  const range = waitingRange(scan.levels, settings.maxCensoredFraction);
  warnings.push(...range.warnings);
  const moments: LevelBatchMoments[] = [];
  let degreesOfFreedom = INTERVAL_BATCHES - 1;
  if (range.hi > 0) {
    degreesOfFreedom = K - 1;
    for (let n = range.lo; n <= range.hi; n++) moments.push(waitingMoments(scan.levels[n - 1]));
  }
  if (K < 2) {
    warnings.push({ code: 'no-pairs', message: `The inputs are too short to cut into two segment pairs of ${MIN_PAIR_LENGTH} symbols: no intervals.` });
  }

  // Cross entropy (nats).
  let cross: RateEstimate;
  let crossNats: number | null = null;
  let crossSe: number | null = null;
  if (moments.length < 2) {
    cross = { estimate: null, ci95: null, standardError: null, lengthsUsed: null, note: 'A slope needs at least two trusted block lengths.' };
  } else {
    const { estimate, interval } = slopeOverLevels(moments, 'mean', confidence);
    crossNats = Number.isFinite(estimate) ? estimate : null;
    crossSe = interval?.standardError ?? null;
    if (interval !== null) degreesOfFreedom = Math.min(degreesOfFreedom, interval.degreesOfFreedom);
    cross = {
      estimate: crossNats === null ? null : crossNats * f,
      ci95: interval === null ? null : [interval.lower * f, interval.upper * f],
      standardError: crossSe === null ? null : crossSe * f,
      lengthsUsed: [range.lo, range.hi],
      note: `Least-squares slope of mean log W_n against n for n = ${range.lo}..${range.hi}; interval by batch means over ${K} segment pairs of A and B.`,
    };
  }

  // sigma^2 of the cross information (nats^2), heuristic. Fitted over every trusted n (1..hi), not
  // only the top levels of the cross-entropy slope: Var(log W_n) is noisy near the censoring limit,
  // and over the four top levels with 8 pairs the slope came out negative in 2 of 7 draws of the
  // validation chain pair at 6e4 symbols, where the whole range gave 0.08 to 0.26 (exact 0.1435,
  // markovCrossFacts). Without a positive value the fluctuation view has no scale.
  let sigma2Nats: number | null = null;
  const varianceLevels: LevelBatchMoments[] = [];
  if (range.hi > 0) for (let n = 1; n <= range.hi; n++) varianceLevels.push(waitingMoments(scan.levels[n - 1]));
  if (varianceLevels.length >= 2) {
    const v = slopeOverLevels(varianceLevels, 'variance', confidence).estimate;
    if (Number.isFinite(v) && v > 0) sigma2Nats = v;
  }

  // h(A) from the analysis of A alone (nats).
  const hA = analysis.entropy;
  const hNats = Number.isFinite(hA.estimate) ? hA.estimate : null;
  const hSe = hA.standardError;
  const entropyA: RateEstimate & { method: string } = {
    estimate: hNats === null ? null : hNats * f,
    ci95: Number.isFinite(hA.ci95[0]) ? [hA.ci95[0] * f, hA.ci95[1] * f] : null,
    standardError: hSe === null ? null : hSe * f,
    lengthsUsed: hA.method === 'none' ? null : hA.lengthsUsed,
    note: `Headline of the analysis of A alone: ${hA.reason}`,
    method: hA.method,
  };
  degreesOfFreedom = Math.max(1, Math.min(degreesOfFreedom, analysis.scan.intervalBatches - 1));

  // Relative entropy: difference with added standard errors (conservative for any correlation).
  let relative: RateEstimate;
  if (crossNats === null || hNats === null) {
    relative = {
      estimate: null,
      ci95: null,
      standardError: null,
      lengthsUsed: null,
      note: crossNats === null ? 'No cross entropy estimate: see its note.' : 'No entropy estimate for A.',
    };
  } else {
    const d = crossNats - hNats;
    const se = crossSe === null || hSe === null ? null : crossSe + hSe;
    const q = tQuantile(0.5 + confidence / 2, degreesOfFreedom);
    relative = {
      estimate: d * f,
      ci95: se === null ? null : [(d - q * se) * f, (d + q * se) * f],
      standardError: se === null ? null : se * f,
      lengthsUsed: cross.lengthsUsed,
      note:
        'Cross entropy minus h(A). Both come from the same A and are dependent; the standard errors are added, ' +
        'which bounds the standard error of the difference for any correlation (conservative).',
    };
    if (se !== null && d + q * se < 0) {
      warnings.push({
        code: 'relative-entropy-negative',
        message:
          `The relative entropy estimate ${(d * f).toPrecision(3)} is below 0 beyond its interval, while the true rate is never negative: ` +
          'the two estimates carry different finite-length biases here.',
      });
    }
  }

  const exact = exactOf(hooks.exact, f);
  const fluctuations = fluctuationsOf(scan, range.hi, hooks.exact, crossNats, sigma2Nats);
  pushDataWarnings(scan, shared.missingInB, range.hi, f, warnings);
  if (M < SHORT_B) warnings.push({ code: 'short-b', message: `B has only ${M} symbols: waiting times are cut short early and every estimate is rough.` });

  return {
    schema: COMPARISON_SCHEMA,
    program: { name: 'returnrate', version: PROGRAM_VERSION },
    inputA: { ...inputA, symbols: N, alphabetSize: countUsed(a) },
    inputB: { ...inputB, symbols: M, alphabetSize: countUsed(b) },
    settings,
    alphabet: { size: shared.alphabet.length, missingInB: shared.missingInB, missingInA: shared.missingInA },
    pairs: K,
    lengths: rowsOf(scan, f),
    crossEntropy: cross,
    entropyA,
    relativeEntropy: relative,
    sigma2Cross: {
      estimate: sigma2Nats === null ? null : sigma2Nats * f * f,
      note:
        varianceLevels.length >= 2
          ? `Slope of Var(log W_n) against n for n = 1..${range.hi}; a heuristic without an interval.`
          : 'A variance slope needs at least two trusted block lengths.',
    },
    unit: rateUnitLabel(settings.unit),
    confidence,
    exact,
    fluctuations,
    trustedRange: range.hi > 0 ? { lo: range.lo, hi: range.hi, reason: range.reason } : null,
    warnings: [...warnings, ...analysis.warnings.map((w) => ({ code: `a-${w.code}`, message: `A alone: ${w.message}` }))],
  };
}

function countUsed(s: Sequence): number {
  let k = 0;
  for (let i = 0; i < s.counts.length; i++) if (s.counts[i] > 0) k++;
  return k;
}

function exactOf(facts: CrossReferenceFacts | undefined, f: number): ComparisonExact | null {
  if (facts === undefined) return null;
  return {
    source: facts.source,
    crossEntropy: facts.crossEntropyNats * f,
    entropyA: facts.entropyANats * f,
    relativeEntropy: facts.relativeEntropyNats * f,
    sigma2Cross: facts.sigma2CrossNats === null ? null : facts.sigma2CrossNats * f * f,
  };
}

function rowsOf(scan: PairedWaits, f: number): ComparisonRow[] {
  return scan.levels.map((level) => {
    let s1 = 0;
    let s2 = 0;
    for (let g = 0; g < scan.pairs; g++) {
      s1 += level.pairSumLog[g];
      s2 += level.pairSumLog2[g];
    }
    const count = level.positions;
    const { mean, variance } = momentsOf(count, s1, s2);
    return {
      n: level.n,
      positions: count,
      observed: level.observed,
      censored: level.censored,
      censoredFraction: count > 0 ? level.censored / count : 0,
      meanLogWait: mean,
      varLogWait: variance,
      ratePerSymbol: mean === null ? null : (mean / level.n) * f,
    };
  });
}

/**
 * (log W_n - n H) / (sigma sqrt n) at the top of the trusted range over the sampled positions, with
 * the exact H and sigma when known, else the estimates (normalizedFluctuations.ts).
 */
function fluctuationsOf(
  scan: PairedWaits,
  hi: number,
  facts: CrossReferenceFacts | undefined,
  crossNats: number | null,
  sigma2Nats: number | null,
): ComparisonFluctuations | null {
  if (hi === 0) return null;
  const exactSigma2 = facts?.sigma2CrossNats ?? null;
  const useExact = facts !== undefined && Number.isFinite(facts.crossEntropyNats) && exactSigma2 !== null && exactSigma2 > 0;
  const rate = useExact ? facts.crossEntropyNats : crossNats;
  const sigma2 = useExact ? exactSigma2 : sigma2Nats;
  if (rate === null || sigma2 === null || !(sigma2 > 0)) return null;
  const { positions, logWait, censored } = scan.sample;
  const column = new Float64Array(positions.length);
  let censoredCount = 0;
  for (let s = 0; s < positions.length; s++) {
    const k = s * scan.maxN + hi - 1;
    column[s] = logWait[k];
    if (censored[k] === 1) censoredCount++;
  }
  const fl = normalizedFluctuations(column, positions, hi, rate, Math.sqrt(sigma2));
  if (fl.values.length < 2) return null;
  return {
    n: hi,
    centreRateNats: rate,
    sigmaNats: Math.sqrt(sigma2),
    basis: useExact ? 'exact' : 'estimate',
    positions: Array.from(fl.positions),
    values: Array.from(fl.values),
    censored: censoredCount,
  };
}

function pushDataWarnings(scan: PairedWaits, missingInB: readonly string[], hi: number, f: number, out: AnalysisWarning[]): void {
  if (missingInB.length > 0) {
    const listed = missingInB.slice(0, 8).map((s) => JSON.stringify(s)).join(', ');
    out.push({
      code: 'symbols-missing-in-b',
      message:
        `A uses ${missingInB.length} symbol${missingInB.length === 1 ? '' : 's'} that B never shows (${listed}${missingInB.length > 8 ? ', ...' : ''}): ` +
        'every block holding one never appears in B, so its wait is censored at every n.',
    });
  }
  // When the range is empty or stops early because of censoring, state the lower bound that the
  // censored waits still give: with each censored wait at its least value, mean log W_n / n.
  const first = scan.levels[hi] ?? null;
  if (first !== null && first.positions > 0 && first.censored / first.positions > 0.05) {
    const count = first.positions;
    let sum = 0;
    for (let g = 0; g < scan.pairs; g++) sum += first.pairSumLog[g];
    const mean = sum / count;
    out.push({
      code: 'many-censored',
      message:
        `At n = ${first.n}, ${((100 * first.censored) / count).toFixed(1)}% of A's blocks never appear in their B segment: ` +
        `mean log W_n / n is at least ${((mean / first.n) * f).toPrecision(3)} there (censored waits counted at their least value), ` +
        'so the cross entropy is large; a longer B would show how large.',
    });
  }
}
