import { useCallback, useMemo } from 'react';
import type { SymbolizationSummary } from '../../core';
import { symbolizationHistogramFigure, symbolizationSeriesFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { symbolizationView } from '../view/symbolizationView';

/** The series, its histogram with the cut points, and the cell counts of a symbolization, before running. */
export function SymbolizationPreview({ summary, scope }: { readonly summary: SymbolizationSummary; readonly scope: string }) {
  const view = useMemo(() => symbolizationView(summary, scope), [summary, scope]);
  const series = useCallback((size: FigureSize) => symbolizationSeriesFigure(summary, size), [summary]);
  const histogram = useCallback((size: FigureSize) => symbolizationHistogramFigure(summary, size), [summary]);
  return (
    <div className="symbolization-preview" data-testid="symbolization-preview">
      <p data-testid="symbolization-spec">{view.specLine}</p>
      <p data-testid="symbolization-cuts">{view.cutsLine}</p>
      <p>{view.missingLine}</p>
      <FigureSlot build={series} testId="symbolization-series" />
      <FigureSlot build={histogram} testId="symbolization-histogram" />
      <div className="table-scroll small" tabIndex={0} role="region" aria-label="Cell counts of the preview, scrollable">
        <table className="compact" data-testid="symbolization-cells">
          <caption>{view.cellsCaption}</caption>
          <thead>
            <tr>
              <th scope="col">Symbol</th>
              <th scope="col" className="num">
                Count
              </th>
              <th scope="col" className="num">
                Share
              </th>
            </tr>
          </thead>
          <tbody>
            {view.cells.map((c) => (
              <tr key={c.label}>
                <th scope="row" className="symbol">
                  {c.label}
                </th>
                <td className="num">{c.count}</td>
                <td className="num">{c.share}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
