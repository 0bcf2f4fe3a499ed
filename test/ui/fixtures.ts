import { ANALYSIS_SCHEMA, DEFAULT_SETTINGS } from '../../src/core/result/analysisResult';
import type { AnalysisResult, LengthRow } from '../../src/core/result/analysisResult';

/** A per-n row with made-up numbers for view tests (layout only, not values of any estimator). */
export function lengthRow(n: number, overrides: Partial<LengthRow> = {}): LengthRow {
  return {
    n,
    positions: 1000 - n + 1,
    observed: 990,
    censored: 10,
    forwardObserved: 980,
    forwardMeanLogReturn: 1.5 * n,
    meanLogReturn: 1.5 * n,
    varLogReturn: 2,
    quantilesLogReturn: [null, null, null, null, null],
    ratePerSymbol: 1.5,
    blockEntropy: n,
    blockEntropyMillerMadow: n,
    conditionalEntropy: 1,
    meanInformation: n,
    distinctBlocks: 2 ** n,
    singletons: 0,
    meanLogRFreq: null,
    varLogRFreq: null,
    censoredFraction: 0.01,
    meanLogReturnCorrected: 1.5 * n,
    varLogReturnCorrected: 2,
    ...overrides,
  };
}

/** A complete AnalysisResult with made-up numbers, for store and view tests. */
export function fakeResult(overrides: Partial<AnalysisResult> = {}): AnalysisResult {
  return {
    schema: ANALYSIS_SCHEMA,
    program: { name: 'returnrate', version: '0.0.0-test' },
    input: { name: 'made-up.txt', symbols: 123_456, alphabetSize: 3, sha256: null, format: 'tokens' },
    settings: DEFAULT_SETTINGS,
    lengths: [lengthRow(1), lengthRow(2), lengthRow(3)],
    entropy: {
      estimate: 0.61234567,
      ci95: [0.6012, 0.6234],
      unit: 'nat/symbol',
      method: 'return-slope',
      reason: 'a reason in words',
      lengthsUsed: [2, 3],
      perSecond: null,
      alternatives: {
        plugin: { estimate: 0.6, ci95: [0.59, 0.61], label: 'Plug-in', note: 'a note', standardError: 0.005, lengthsUsed: [3, 3] },
        match: { estimate: 0.58, ci95: null, label: 'Match lengths', note: '', standardError: null, lengthsUsed: null },
      },
      standardError: 0.0056,
      confidence: 0.95,
      perSecondUnit: null,
    },
    sigma2: {
      estimate: 0.15,
      ci95: [0.1, 0.2],
      method: 'batch-means',
      negligible: false,
      alternatives: {},
      unit: 'nat^2/symbol',
      reason: 'why',
      standardError: 0.025,
    },
    exponentialLaw: null,
    paths: { positions: [0, 10], logReturn: [[0.1, 0.2, null], [0.3, null, null]] },
    reference: null,
    warnings: [{ code: 'made-up', message: 'a made-up warning' }],
    trustedRange: { lo: 2, hi: 3, reason: 'a range reason' },
    scan: { maxN: 3, exhausted: false, batchLength: 100, batchCount: 10, intervalBatches: 10, matchWindow: 100 },
    ...overrides,
  };
}
