import type { EntropyUnit, LengthRow } from './analysisResult';
import { LENGTH_QUANTILES } from '../estimate/lengthTable';

/** A number as CSV text: shortest round-trip form, empty for null or non-finite. */
function num(x: number | null | undefined): string {
  return x === null || x === undefined || !Number.isFinite(x) ? '' : String(x);
}

/**
 * The per-n table as CSV (RFC 4180 style, comma-separated, '\n' line ends, header first). Column
 * names carry their unit: `_nat` / `_nat2` for log R and its moments, `_<unit>` for entropies in
 * the output unit; empty cells where a value is undefined (no observed returns).
 */
export function lengthsCsv(rows: readonly LengthRow[], unit: EntropyUnit): string {
  const q = LENGTH_QUANTILES.map((p) => `q${String(Math.round(p * 100)).padStart(2, '0')}_log_R_nat`);
  const header = [
    'n',
    'positions',
    'observed',
    'censored',
    'censored_fraction',
    'mean_log_R_nat',
    'var_log_R_nat2',
    'mean_log_R_corrected_nat',
    'var_log_R_corrected_nat2',
    ...q,
    'forward_observed',
    'forward_mean_log_R_nat',
    `rate_per_symbol_${unit}`,
    `block_entropy_${unit}`,
    `block_entropy_miller_madow_${unit}`,
    `conditional_entropy_${unit}`,
    `mean_information_${unit}`,
    'distinct_blocks',
    'singletons',
    'mean_log_R_freq_nat',
    'var_log_R_freq_nat2',
  ];
  const lines = [header.join(',')];
  for (const r of rows) {
    lines.push(
      [
        num(r.n),
        num(r.positions),
        num(r.observed),
        num(r.censored),
        num(r.censoredFraction),
        num(r.meanLogReturn),
        num(r.varLogReturn),
        num(r.meanLogReturnCorrected),
        num(r.varLogReturnCorrected),
        ...LENGTH_QUANTILES.map((_, k) => num(r.quantilesLogReturn[k])),
        num(r.forwardObserved),
        num(r.forwardMeanLogReturn),
        num(r.ratePerSymbol),
        num(r.blockEntropy),
        num(r.blockEntropyMillerMadow),
        num(r.conditionalEntropy),
        num(r.meanInformation),
        num(r.distinctBlocks),
        num(r.singletons),
        num(r.meanLogRFreq),
        num(r.varLogRFreq),
      ].join(','),
    );
  }
  return lines.join('\n') + '\n';
}
