import type {
  AlternativeEstimate,
  AnalysisResult,
  AnalysisSettings,
  AnalysisWarning,
  InputSummary,
  LengthRow,
} from './result/analysisResult';
import { alphabetSummary } from './result/alphabetSummary';
import { ANALYSIS_SCHEMA } from './result/analysisResult';
import { PROGRAM_VERSION } from './result/version';
import type { LevelStats, ReturnScan } from './returns/levelStats';
import { scanReturns, type ScanOptions, type ShareProgress } from './returns/scanReturns';
import type { Sequence } from './sequence/sequence';
import { batchMeansInterval, batchPlan, INTERVAL_BATCHES } from './estimate/batchMeans';
import { chooseEntropyHeadline, type EntropyMethod } from './estimate/entropyHeadline';
import type { EstimatorResult } from './estimate/estimatorResult';
import { exponentialLaw, LOG_EXPONENTIAL_VARIANCE } from './estimate/exponentialLaw';
import { informationVariance } from './estimate/informationVariance';
import { lengthTable } from './estimate/lengthTable';
import { levelBatchMoments, type LevelBatchMoments } from './estimate/levelBatchMoments';
import { matchLength } from './estimate/matchLength';
import { pluginConditional } from './estimate/pluginConditional';
import { returnMean } from './estimate/returnMean';
import { returnSlope } from './estimate/returnSlope';
import { trustedRange, type LowerRule } from './estimate/trustedRange';
import {
  entropyFactor,
  entropyFromNats,
  varianceFromNats,
  perSecond,
  perSecondUnitLabel,
  rateUnitLabel,
  varianceUnitLabel,
} from './estimate/units';
import { varianceGrowth } from './estimate/varianceGrowth';
import { mixingDiagnostics, type ScanFreeDiagnostics } from './diagnostics/mixingDiagnostics';

/** Progress, cancellation and reference facts passed through analyzeSequence. */
export interface AnalysisHooks {
  /** Called after each block length n with the number of positions still in play. */
  readonly onLevel?: (n: number, active: number) => void;
  /** Called after each block length with its level statistics (after onLevel), for hosts that show
   * results level by level (lengthRowOfLevel builds the table row). The level is the scan's own:
   * read it, do not keep mutating it. */
  readonly onLevelStats?: (level: LevelStats, active: number) => void;
  /** Shared scans: the class groups' progress (ScanOptions.onShares), while no level completes. */
  readonly onShares?: (progress: ShareProgress) => void;
  /** Polled during the scan; returning true abandons it with ScanCancelled. */
  readonly shouldStop?: () => boolean;
  /** Facts of the reference source the sequence was generated from, in nats; the result states them
   * in the output unit. */
  readonly reference?: ReferenceFacts;
  /** Positions to sample for the paths (rounded so the stride is a power of two); default 256. */
  readonly pathSamples?: number;
}

/** A reference source's exact values in nats (per symbol, and nats^2 for sigma^2). */
export interface ReferenceFacts {
  readonly source: string;
  readonly entropyRateNats: number | null;
  readonly sigma2Nats: number | null;
}

/** Method knobs for studies and tests; the defaults are the documented rules. */
export interface AnalysisMethodOptions {
  /** Bottom of the trusted range (trustedRange.ts); default 'top-two'. */
  readonly lowerRule?: LowerRule;
  /** Coarse batches for every interval; default INTERVAL_BATCHES (32). */
  readonly intervalBatches?: number;
  readonly reference?: ReferenceFacts;
}

/** Fewer symbols than this get a 'short-sequence' warning. */
const SHORT_SEQUENCE = 1000;
/** Fewer coarse batches than this get a 'few-batches' warning: the t intervals become very wide. */
const FEW_BATCHES = 8;
/** sigma^2 counts as negligible when n_hi times its upper limit is below this share of pi^2/6. */
const NEGLIGIBLE_SHARE = 0.1;

/**
 * Checks settings against a sequence of N symbols.
 * @throws RangeError naming the bad setting and value
 */
export function validateSettings(settings: AnalysisSettings, N: number): void {
  const { maxN, unit, intervalSeconds, maxCensoredFraction, confidence } = settings;
  if (!Number.isInteger(N) || N < 2) throw new RangeError(`the sequence needs at least 2 symbols; got ${N}`);
  if (!Number.isInteger(maxN) || maxN < 1 || maxN > N - 1) {
    throw new RangeError(`maxN must be an integer from 1 to N - 1 = ${N - 1}; got ${maxN}`);
  }
  if (unit !== 'nat' && unit !== 'bit') throw new RangeError(`unit must be 'nat' or 'bit'; got ${String(unit)}`);
  if (intervalSeconds !== null && !(Number.isFinite(intervalSeconds) && intervalSeconds > 0)) {
    throw new RangeError(`intervalSeconds must be null or a positive finite number; got ${intervalSeconds}`);
  }
  if (!(maxCensoredFraction >= 0 && maxCensoredFraction < 1)) {
    throw new RangeError(`maxCensoredFraction must be in [0, 1); got ${maxCensoredFraction}`);
  }
  if (!(confidence > 0 && confidence < 1)) throw new RangeError(`confidence must be in (0, 1); got ${confidence}`);
}

/**
 * The whole analysis of one sequence: scan the return times of its n-blocks for n = 1..maxN, then
 * estimate h and sigma^2 with intervals, and collect warnings.
 * @param input what to record about the input; symbols and alphabet size are taken from the sequence
 * @throws RangeError for invalid settings; ScanCancelled when hooks.shouldStop returns true
 */
export function analyzeSequence(
  sequence: Sequence,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  hooks: AnalysisHooks = {},
): AnalysisResult {
  validateSettings(settings, sequence.symbols.length);
  const scan = scanReturns(sequence.symbols, sequence.alphabet.length, scanOptionsOf(settings, hooks));
  return analyzeScannedSequence(sequence, scan, input, settings, hooks);
}

/** The scan options of an analysis: maxN, the path sample size and the hooks. */
export function scanOptionsOf(settings: AnalysisSettings, hooks: AnalysisHooks): ScanOptions {
  const { onLevel, onLevelStats } = hooks;
  return {
    maxN: settings.maxN,
    ...(hooks.pathSamples === undefined ? {} : { sampleTarget: hooks.pathSamples }),
    ...(onLevel === undefined && onLevelStats === undefined
      ? {}
      : {
          onLevel: (level, active) => {
            onLevel?.(level.n, active);
            onLevelStats?.(level, active);
          },
        }),
    ...(hooks.shouldStop === undefined ? {} : { shouldStop: hooks.shouldStop }),
    ...(hooks.onShares === undefined ? {} : { onShares: hooks.onShares }),
  };
}

/**
 * The analysis of a sequence whose scan is done (by scanReturns here, or shared among workers):
 * the estimates from the scan, then the diagnostics from the symbols.
 * @param scanFree the diagnostics that need no scan, when a worker computed them during it
 */
export function analyzeScannedSequence(
  sequence: Sequence,
  scan: ReturnScan,
  input: Omit<InputSummary, 'symbols' | 'alphabetSize'>,
  settings: AnalysisSettings,
  hooks: AnalysisHooks = {},
  scanFree?: ScanFreeDiagnostics,
): AnalysisResult {
  const listed = alphabetSummary(sequence);
  const summary: InputSummary = {
    ...input,
    symbols: sequence.symbols.length,
    alphabetSize: sequence.alphabet.length,
    alphabet: listed.symbols,
    alphabetUnlisted: listed.unlisted,
  };
  const result = analyzeFromScan(scan, summary, settings, hooks.reference === undefined ? {} : { reference: hooks.reference });
  // Diagnostics need the symbols themselves (the scan keeps only sums): the plug-in order of sigma^2
  // feeds the ACF, the interval batches (shortest coarse batch) the reading.
  const { batchLength, batchCount, intervalBatches } = result.scan;
  const diagnostics = mixingDiagnostics(sequence.symbols, sequence.alphabet.length, {
    informationOrder: result.sigma2.alternatives['information-batch-means']?.lengthsUsed?.[0] ?? 1,
    ...(intervalBatches > 0 ? { batchLength: Math.floor(batchCount / intervalBatches) * batchLength, intervalBatches } : {}),
  }, scanFree);
  return { ...result, diagnostics };
}

/**
 * One row of the alternatives table. `biased` estimators (a bias of known order that does not vanish
 * at the n used) get no interval: it would describe only their sampling error, and in the coverage
 * study such intervals covered the exact value in 0 to 13% of trials (DEVELOPERS.md).
 */
function alternative(r: EstimatorResult, label: string, f: number, biased = false): AlternativeEstimate {
  return {
    estimate: r.estimate === null ? null : r.estimate * f,
    ci95: r.interval === null || biased ? null : [r.interval[0] * f, r.interval[1] * f],
    label,
    note: biased ? `${r.note} No interval is given: it would cover only the sampling error, not this bias.` : r.note,
    standardError: r.standardError === null ? null : r.standardError * f,
    lengthsUsed: r.lengthsUsed,
  };
}

/**
 * The analysis of an existing scan (for tests with the brute-force scan, and for hosts that keep
 * the scan). Settings are checked as in analyzeSequence, with maxN compared with the scan's.
 */
export function analyzeFromScan(
  scan: ReturnScan,
  input: InputSummary,
  settings: AnalysisSettings,
  method: AnalysisMethodOptions = {},
): AnalysisResult {
  validateSettings(settings, scan.length);
  const { unit, confidence } = settings;
  const f = entropyFactor(unit);
  const levels = scan.levels;
  const warnings: AnalysisWarning[] = [];
  const rows: LengthRow[] = lengthTable(levels, unit);
  const intervalBatches = method.intervalBatches ?? INTERVAL_BATCHES;
  const planAt = (positions: number) => batchPlan(scan.batchLength, scan.batchCount, positions, intervalBatches);

  // Return-time estimators on the trusted range.
  const meanStandardError = (level: LevelStats): number | null => {
    const m = levelBatchMoments(level, planAt(level.positions));
    if (m.mean === null) return null;
    return batchMeansInterval(m.mean, m.batchMean, m.batchObserved, confidence)?.standardError ?? null;
  };
  const range = trustedRange(levels, {
    maxCensoredFraction: settings.maxCensoredFraction,
    meanStandardError,
    ...(method.lowerRule === undefined ? {} : { lowerRule: method.lowerRule }),
  });
  warnings.push(...range.warnings);
  const rangePlan = range.hi > 0 ? planAt(levels[range.hi - 1].positions) : null;
  const moments: LevelBatchMoments[] = [];
  if (rangePlan !== null) for (let n = range.lo; n <= range.hi; n++) moments.push(levelBatchMoments(levels[n - 1], rangePlan));
  const top = moments.length > 0 ? moments[moments.length - 1] : null;
  const slope = returnSlope(moments, confidence);
  const mean = returnMean(top, confidence);
  const plugin = pluginConditional(levels, planAt, confidence);
  const match = matchLength(scan);

  // sigma^2: information batch means (headline) and variance growth of log R_n (alternative).
  const info = informationVariance(levels, planAt, confidence, plugin.converged ? plugin.k : null);
  const growth = varianceGrowth(moments, confidence);
  const f2 = f * f;
  const nTop = range.hi > 0 ? range.hi : 1;
  const upper = info.interval === null ? null : info.interval[1];
  const negligible = upper !== null && nTop * upper < NEGLIGIBLE_SHARE * LOG_EXPONENTIAL_VARIANCE;
  const choice = chooseEntropyHeadline(
    { returnSlope: slope, pluginConditional: plugin, returnMean: mean, matchLength: match, sigma2Negligible: negligible },
    rateUnitLabel(unit),
  );
  warnings.push(...choice.warnings);
  const byMethod: Record<Exclude<EntropyMethod, 'none'>, EstimatorResult> = {
    'return-slope': slope,
    'plugin-conditional': plugin,
    'return-mean': mean,
    'match-length': match,
  };
  const chosen = choice.method === 'none' ? null : byMethod[choice.method];
  const estimate = chosen?.estimate ?? Number.NaN;
  const interval = chosen?.interval ?? null;
  const ci: readonly [number, number] = interval === null ? [Number.NaN, Number.NaN] : [interval[0] * f, interval[1] * f];
  const headlineInterval = { estimate: estimate * f, ci95: ci };

  const law = negligible && range.hi > 0 ? exponentialLaw(rows[range.hi - 1]) : null;
  if (negligible) {
    warnings.push({
      code: 'sigma2-negligible',
      message:
        `sigma^2 is at most ${upper.toPrecision(2)} nat^2 per symbol, so at n = ${nTop} the Gaussian part n sigma^2 is below ` +
        `${NEGLIGIBLE_SHARE * 100}% of the Exp(1) part pi^2/6 of Var log R_n: fluctuations of log R_n are not Gaussian at scale sqrt(n); ` +
        `compare R_n times the block frequency with the exponential law instead.`,
    });
  }

  pushDataWarnings(scan, range.hi, settings.maxN, plugin.wellSampled, info.k, match.truncated, rangePlan?.count ?? null, warnings);

  const facts = method.reference;
  const reference =
    facts === undefined
      ? null
      : {
          source: facts.source,
          entropyRate: facts.entropyRateNats === null ? null : entropyFromNats(facts.entropyRateNats, settings.unit),
          sigma2: facts.sigma2Nats === null ? null : varianceFromNats(facts.sigma2Nats, settings.unit),
        };
  return {
    schema: ANALYSIS_SCHEMA,
    program: { name: 'returnrate', version: PROGRAM_VERSION },
    input,
    settings,
    lengths: rows,
    entropy: {
      ...headlineInterval,
      unit: rateUnitLabel(unit),
      method: choice.method,
      reason:
        range.hi > 0 && (choice.method === 'return-slope' || choice.method === 'return-mean')
          ? `${choice.reason} Block lengths: ${range.reason}`
          : choice.reason,
      lengthsUsed: chosen?.lengthsUsed ?? [0, 0],
      perSecond: settings.intervalSeconds === null || interval === null ? null : perSecond(headlineInterval, settings.intervalSeconds),
      alternatives: {
        'return-slope': alternative(slope, 'Slope of mean log R_n against n', f),
        'plugin-conditional': alternative(plugin, 'Plug-in conditional block entropy (Miller-Madow)', f),
        'return-mean': alternative(mean, 'Mean log R_n / n at the top of the range', f, true),
        'match-length': alternative(match, 'Sliding-window match lengths', f),
      },
      standardError: chosen?.standardError == null ? null : chosen.standardError * f,
      confidence,
      perSecondUnit: settings.intervalSeconds === null ? null : perSecondUnitLabel(unit),
    },
    sigma2: {
      estimate: info.estimate === null ? Number.NaN : info.estimate * f2,
      ci95: info.interval === null ? [Number.NaN, Number.NaN] : [info.interval[0] * f2, info.interval[1] * f2],
      method: 'information-batch-means',
      negligible,
      alternatives: {
        'information-batch-means': {
          estimate: info.estimate === null ? null : info.estimate * f2,
          ci95: info.interval === null ? null : [info.interval[0] * f2, info.interval[1] * f2],
          label: 'Long-run variance of the conditional information',
          note: info.note,
          standardError: info.standardError === null ? null : info.standardError * f2,
          lengthsUsed: [info.k, info.k],
        },
        'variance-growth': alternative(growth, 'Slope of Var(log R_n) against n', f2, true),
      },
      unit: varianceUnitLabel(unit),
      reason:
        `The conditional information estimates sigma^2 directly from the information function, while the growth of ` +
        `Var(log R_n) mixes in the Exp(1) term and its finite-n drift. ${info.note}`,
      standardError: info.standardError === null ? null : info.standardError * f2,
    },
    exponentialLaw: law,
    paths: pathsOf(scan),
    reference,
    warnings,
    trustedRange: range.hi > 0 ? { lo: range.lo, hi: range.hi, reason: range.reason } : null,
    scan: {
      maxN: scan.maxN,
      exhausted: scan.exhausted,
      batchLength: scan.batchLength,
      batchCount: scan.batchCount,
      intervalBatches: rangePlan?.count ?? planAt(levels[0]?.positions ?? 0).count,
      matchWindow: scan.matchWindow,
    },
  };
}

/** Warnings about the data themselves (not about one estimator). */
function pushDataWarnings(
  scan: ReturnScan,
  hi: number,
  maxN: number,
  pluginK: number,
  sigmaK: number,
  matchTruncated: boolean,
  batches: number | null,
  out: AnalysisWarning[],
): void {
  const first = scan.levels[0];
  if (scan.length < SHORT_SEQUENCE) {
    out.push({ code: 'short-sequence', message: `Only ${scan.length} symbols: every estimate here is rough.` });
  }
  if (first !== undefined && first.distinctBlocks === 1) {
    // Every other data warning (maxN reached, matches cut short) would only restate this.
    out.push({ code: 'single-symbol', message: 'The sequence uses a single symbol: its entropy rate is 0 and nothing fluctuates.' });
    return;
  }
  if (first !== undefined && first.observed === 0) {
    out.push({ code: 'no-returns', message: 'No symbol ever recurs: return times are all censored.' });
  } else if (scan.exhausted && hi === 0) {
    // Blocks always become unique eventually; it only matters when nothing was left to trust.
    const unique = scan.levels.find((l) => l.distinctBlocks === l.positions);
    out.push({
      code: 'all-unique',
      message: `Every block of length ${unique?.n ?? '?'} is already unique: the data repeat too little for return times.`,
    });
  }
  if (hi > 0 && hi === maxN && !scan.exhausted) {
    out.push({
      code: 'max-n-reached',
      message: `The trusted range reaches maxN = ${maxN} with little censoring: a larger maxN would let larger, less biased n be used.`,
    });
  }
  if (matchTruncated) {
    out.push({
      code: 'match-truncated',
      message: `Some matches are longer than maxN = ${maxN}: match lengths are cut short and the match-length estimate is too high.`,
    });
  }
  if (pluginK === 0) {
    out.push({
      code: 'undersampled',
      message: 'Even single symbols are not well sampled (fewer than 20 per symbol on average, or more than 0.1% seen once): plug-in entropies are biased low.',
    });
  }
  if (sigmaK === 1 && scan.levels.length > 0 && scan.levels[0].positions / Math.max(1, scan.levels[0].distinctBlocks) < 100) {
    out.push({
      code: 'sigma2-undersampled',
      message: 'Symbols are seen fewer than 100 times each on average: sigma^2 from the conditional information is biased upward.',
    });
  }
  if (batches !== null && batches < FEW_BATCHES) {
    out.push({ code: 'few-batches', message: `Only ${batches} batches for the confidence intervals: they are wide and rough.` });
  }
}

/** Sampled forward paths in nats: log R (null where censored or past the end), the censoring bound
 * and log of the block's count. */
function pathsOf(scan: ReturnScan): AnalysisResult['paths'] {
  const { positions, forward, counts, maxN } = scan.paths;
  const logReturn: (number | null)[][] = [];
  const logCensoredBound: (number | null)[][] = [];
  const logCount: (number | null)[][] = [];
  for (let s = 0; s < positions.length; s++) {
    const row: (number | null)[] = new Array<number | null>(maxN);
    const bound: (number | null)[] = new Array<number | null>(maxN);
    const count: (number | null)[] = new Array<number | null>(maxN);
    for (let n = 1; n <= maxN; n++) {
      const k = s * maxN + n - 1;
      const r = forward[k];
      row[n - 1] = r > 0 ? Math.log(r) : null;
      // A censored return is only known to exceed N - n - i = -r - 1 (which may be 0).
      bound[n - 1] = r < 0 && -r - 1 > 0 ? Math.log(-r - 1) : null;
      count[n - 1] = counts[k] > 0 ? Math.log(counts[k]) : null;
    }
    logReturn.push(row);
    logCensoredBound.push(bound);
    logCount.push(count);
  }
  return { positions: Array.from(positions), logReturn, logCensoredBound, logCount };
}
