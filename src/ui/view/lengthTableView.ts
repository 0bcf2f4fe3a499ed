import type { AnalysisResult } from '../../core';
import { DEFAULT_DECIMALS, formatCount, formatFixed, formatPercent } from './format';

export interface LengthTableRow {
  readonly n: number;
  readonly inTrustedRange: boolean;
  readonly positions: string;
  readonly censored: string;
  readonly meanLogReturn: string;
  readonly ratePerSymbol: string;
  readonly conditionalEntropy: string;
  readonly distinctBlocks: string;
}

/** The compact per-n table: one row per block length, rows inside the trusted range marked. */
export function lengthTableView(result: AnalysisResult): { readonly unit: string; readonly rows: readonly LengthTableRow[] } {
  const range = result.trustedRange;
  const rows = result.lengths.map((row) => ({
    n: row.n,
    inTrustedRange: range !== null && row.n >= range.lo && row.n <= range.hi,
    positions: formatCount(row.positions),
    censored: formatPercent(row.censoredFraction),
    meanLogReturn: formatFixed(row.meanLogReturnCorrected ?? row.meanLogReturn, 3),
    ratePerSymbol: formatFixed(row.ratePerSymbol, DEFAULT_DECIMALS),
    conditionalEntropy: formatFixed(row.conditionalEntropy, DEFAULT_DECIMALS),
    distinctBlocks: formatCount(row.distinctBlocks),
  }));
  return { unit: result.settings.unit, rows };
}
