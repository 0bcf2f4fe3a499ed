import { useCallback, useMemo } from 'react';
import type { SymbolizationSummary } from '../../core';
import { symbolizationHistogramFigure, symbolizationSeriesFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { SymbolCountTable } from './SymbolCountTable';
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
      <SymbolCountTable
        rows={view.cells.map((c) => ({ symbol: c.label, count: c.count, share: c.share }))}
        caption={view.cellsCaption}
        regionLabel="Cell counts of the preview, scrollable"
        testId="symbolization-cells"
      />
    </div>
  );
}
