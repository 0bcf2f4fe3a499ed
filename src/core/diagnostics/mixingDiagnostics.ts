import type { SymbolArray } from '../sequence/sequence';
import { estimateBetaMixing, SIGNAL_FACTOR, type BetaMixingEstimate } from './betaMixing';
import { fitExponentialDecay, fitPowerDecay, fitTailPowerDecay, gapsAboveFloor, type DecayFit } from './decayFits';
import { INTERVAL_BATCHES } from '../estimate/batchMeans';
import { informationAutocorrelation } from './informationAutocorrelation';
import { informationMoments, type InformationMoments } from './informationMoments';
import { mixingReading, type MixingReading } from './mixingReading';

/** The diagnostics of one analysis: plain, serializable data (AnalysisResult.diagnostics). */
export interface DiagnosticsSummary {
  /** Estimated beta-mixing coefficients; null when the sequence is too short. */
  readonly beta: {
    readonly blockLength: number;
    readonly symbolsKept: number;
    readonly cells: number;
    readonly stride: number;
    readonly pairs: number;
    readonly gaps: readonly number[];
    readonly beta: readonly number[];
    readonly noiseFloor: readonly number[];
    /** Multiple of the noise floor above which a coefficient counts as signal. */
    readonly signalFactor: number;
    /** Leading gaps above signalFactor x noise floor (the ones fitted). */
    readonly gapsAboveFloor: number;
    readonly exponential: DecayFit | null;
    readonly power: DecayFit | null;
    /** Power law over the later gaps above the threshold, floor removed (the reading's rate);
     * absent in results saved before it was added. */
    readonly tailPower?: DecayFit | null;
    /** Noise floor over the floor that treats pairs as independent (serial-dependence inflation);
     * absent in older results. */
    readonly floorInflation?: number;
    /** How m and the gaps were chosen, and the bias caveat. */
    readonly note: string;
  } | null;
  /** ACF of the information increments; null when too short. */
  readonly autocorrelation: {
    readonly order: number;
    readonly lags: readonly number[];
    readonly acf: readonly number[];
    readonly band: number;
    readonly positions: number;
    readonly segments: number;
    readonly outside: number;
    readonly expectedOutside: number;
    readonly note: string;
  } | null;
  /** Raw moments of the one-symbol information (nats). */
  readonly moments: (InformationMoments & { readonly note: string }) | null;
  readonly reading: MixingReading;
}

/** Inputs beyond the sequence. */
export interface DiagnosticsOptions {
  /** Block length k of the conditional information (the one sigma^2 uses). */
  readonly informationOrder: number;
  /** Symbols in one batch of the confidence intervals (for the reading); default N / INTERVAL_BATCHES. */
  readonly batchLength?: number;
  /** Number of interval batches; default INTERVAL_BATCHES. */
  readonly intervalBatches?: number;
}

/** The diagnostics that need nothing from the scan: plain data, so a worker can compute them while
 * the scan runs (scanJobs.ts) and post them back. */
export interface ScanFreeDiagnostics {
  readonly beta: BetaMixingEstimate | null;
  readonly moments: InformationMoments | null;
}

/** The beta-mixing coefficients and the information moments: the costly part of the diagnostics. */
export function scanFreeDiagnostics(symbols: SymbolArray, alphabetSize: number): ScanFreeDiagnostics {
  return { beta: estimateBetaMixing(symbols, alphabetSize), moments: informationMoments(symbols, alphabetSize) };
}

/**
 * All diagnostics for one sequence: beta-mixing coefficients with decay fits, the ACF of the
 * information increments, the one-symbol information moments, and the reading in words.
 * @param scanFree the part computed already (scanFreeDiagnostics), when a worker did it
 */
export function mixingDiagnostics(symbols: SymbolArray, alphabetSize: number, options: DiagnosticsOptions, scanFree?: ScanFreeDiagnostics): DiagnosticsSummary {
  const { beta: est, moments } = scanFree ?? scanFreeDiagnostics(symbols, alphabetSize);
  const acf = informationAutocorrelation(symbols, alphabetSize, Math.max(1, options.informationOrder));
  let beta: DiagnosticsSummary['beta'] = null;
  let belowFrom: number | null = null;
  if (est !== null) {
    const threshold = est.noiseFloor.map((f) => SIGNAL_FACTOR * f);
    const above = gapsAboveFloor(est.beta, threshold);
    belowFrom = above < est.gaps.length ? est.gaps[above] : null;
    const pairs = est.pairs.reduce((a, b) => Math.min(a, b), Infinity);
    beta = {
      blockLength: est.blockLength,
      symbolsKept: est.symbolsKept,
      cells: est.cells,
      stride: est.stride,
      pairs,
      gaps: est.gaps,
      beta: est.beta,
      noiseFloor: est.noiseFloor,
      signalFactor: SIGNAL_FACTOR,
      gapsAboveFloor: above,
      exponential: fitExponentialDecay(est.gaps, est.beta, above),
      power: fitPowerDecay(est.gaps, est.beta, above),
      tailPower: fitTailPowerDecay(est.gaps, est.beta, est.noiseFloor, above),
      floorInflation: est.floorInflation,
      note:
        `Block length m = ${est.blockLength}: the largest m with ${est.symbolsKept}^(2m) = ${est.cells} joint cells at most 1/1000 of the ` +
        `${pairs} pairs per gap${est.symbolsKept < alphabetSize ? ` (the ${est.symbolsKept - 1} most frequent symbols kept, the rest merged into one class, which can only lower beta)` : ''}` +
        `${est.stride > 1 ? `; every ${est.stride}th position starts a pair` : ''}. The estimate is biased upward when N is small against the number of cells; ` +
        `the noise floor is its expected value under independence (with the variance of serially dependent pairs, x${est.floorInflation.toFixed(2)} here), and the fits use the leading gaps where beta(k) exceeds ${SIGNAL_FACTOR} x the floor; ` +
        'the reading\'s power-law rate is fitted to beta(k) minus the floor over the later half of those gaps.',
    };
  }
  const reading = mixingReading({
    blockLength: beta?.blockLength ?? 0,
    gapRange: beta === null ? [0, 0] : [beta.gaps[0], beta.gaps[beta.gaps.length - 1]],
    gapsAboveFloor: beta?.gapsAboveFloor ?? 0,
    belowFloorFrom: beta === null ? null : belowFrom,
    exponential: beta?.exponential ?? null,
    power: beta?.power ?? null,
    tailPower: beta?.tailPower ?? null,
    batchLength: Math.max(1, Math.floor(options.batchLength ?? symbols.length / INTERVAL_BATCHES)),
    intervalBatches: options.intervalBatches ?? INTERVAL_BATCHES,
    acfOutside: acf?.outside ?? null,
    acfExpectedOutside: acf?.expectedOutside ?? null,
  });
  return {
    beta,
    autocorrelation:
      acf === null
        ? null
        : {
            order: acf.order,
            lags: acf.lags,
            acf: acf.acf,
            band: acf.band,
            positions: acf.positions,
            segments: acf.segments,
            outside: acf.outside,
            expectedOutside: acf.expectedOutside,
            note:
              `Increments Y_t = -log p^(x_t | previous ${acf.order - 1} symbols), plug-in counts over the whole sequence, centred; ` +
              `${acf.positions} positions${acf.segments > 1 ? ` in ${acf.segments} evenly spaced segments` : ''}; band +-1.96/sqrt(n).`,
          },
    moments:
      moments === null
        ? null
        : {
            ...moments,
            note:
              'Raw moments E[I^r] (not central) of I = -log(count/N) of one symbol, nats^r, with batch-means standard errors (sampling noise only). ' +
              'An order is marked unresolved when symbols seen once carry more than 5% of it, (f1/N)(log N)^r: the unseen tail then biases it low. ' +
              'Heavy-tail rule: warn when (f1/N)(log N - mean)^2 exceeds 10% of the variance (f1 = symbols seen once; f1/N is Good\'s estimate of the unseen mass).',
          },
    reading,
  };
}
