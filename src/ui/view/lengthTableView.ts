import type { AnalysisResult, LengthRow } from '../../core';
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

export interface LengthTableView {
  readonly unit: string;
  readonly rows: readonly LengthTableRow[];
}

/** The compact per-n table: one row per block length, rows inside the trusted range marked. */
export function lengthTableView(result: AnalysisResult): LengthTableView {
  return lengthRowsView(result.lengths, result.trustedRange, result.settings.unit);
}

/** The same table from rows alone (a running run's partial rows have no trusted range yet: pass null). */
export function lengthRowsView(lengths: readonly LengthRow[], range: AnalysisResult['trustedRange'], unit: string): LengthTableView {
  const rows = lengths.map((row) => ({
    n: row.n,
    inTrustedRange: range !== null && row.n >= range.lo && row.n <= range.hi,
    positions: formatCount(row.positions),
    censored: formatPercent(row.censoredFraction),
    meanLogReturn: formatFixed(row.meanLogReturnCorrected ?? row.meanLogReturn, 3),
    ratePerSymbol: formatFixed(row.ratePerSymbol, DEFAULT_DECIMALS),
    conditionalEntropy: formatFixed(row.conditionalEntropy, DEFAULT_DECIMALS),
    distinctBlocks: formatCount(row.distinctBlocks),
  }));
  return { unit, rows };
}
