import type { SymbolizationSummary } from '../../core';
import { formatCount, formatPercent } from './format';

/** What the preview prints about a symbolization beside its two figures. */
export interface SymbolizationView {
  readonly specLine: string;
  readonly cutsLine: string;
  readonly missingLine: string;
  readonly cellsCaption: string;
  readonly cells: readonly { readonly label: string; readonly count: string; readonly share: string }[];
}

/** Cut points shown with up to 6 significant digits (the exact ones go into the result). */
function short(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/**
 * The preview's text about a symbolization of the head: spec, cut points, missing values and the
 * count of every cell. `scope` says where the values came from (e.g. 'in the first 64 KiB').
 */
export function symbolizationView(summary: SymbolizationSummary, scope: string): SymbolizationView {
  const r = summary.record;
  const total = summary.cells.reduce((sum, c) => sum + c.count, 0);
  const cuts = r.cutPoints;
  return {
    specLine: `Symbolization ${r.spec}: ${formatCount(r.values)} values ${scope} give ${formatCount(total)} symbols.`,
    cutsLine:
      cuts.length === 0
        ? 'Ordinal patterns have no cut points.'
        : `Cut points ${scope}: ${cuts.map(short).join(', ')} (a value equal to a cut point goes to the cell above)${r.spec.startsWith('quantile') ? '; the run computes them from the whole file' : ''}.`,
    missingLine:
      r.missing === 0
        ? `No missing values ${scope}.`
        : r.missingPolicy === 'skip'
          ? `${formatCount(r.missing)} missing value${r.missing === 1 ? '' : 's'} ${scope}, skipped.`
          : `${formatCount(r.missing)} missing value${r.missing === 1 ? '' : 's'} ${scope}: ${r.segments} segment${r.segments === 1 ? '' : 's'}.`,
    cellsCaption: `Symbols (cells) ${scope}`,
    cells: summary.cells.map((c) => ({ label: c.label, count: formatCount(c.count), share: total > 0 ? formatPercent(c.count / total) : '–' })),
  };
}
