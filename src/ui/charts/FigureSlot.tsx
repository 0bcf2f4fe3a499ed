import { useMemo, type ReactNode } from 'react';
import type { CalibrationFigureId, ComparisonFigureId, DiagnosticFigureId, ExportFigureId, Figure, FigureCaption, FigureSize } from '../../figures';
import { ChartFrame } from './ChartFrame';
import { ExportToolbar } from './ExportToolbar';
import { figureHeight, useElementWidth } from './useElementWidth';
import { useStaggeredValue } from './useStaggeredValue';

/** Measures the available width, asks `build` for the figure at that size, and draws it or its reason for being absent;
 * with `exportId`, download buttons for it follow. */
export function FigureSlot({
  build,
  testId,
  exportId,
  exportCaption,
}: {
  readonly build: (size: FigureSize) => Figure;
  readonly testId: string;
  readonly exportId?: ExportFigureId | DiagnosticFigureId | CalibrationFigureId | ComparisonFigureId | undefined;
  /** The caption of a figure not drawn from the shown result (calibration, comparison); it also names the files. */
  readonly exportCaption?: FigureCaption | undefined;
}): ReactNode {
  const { ref, width } = useElementWidth<HTMLDivElement>();
  const w = Math.max(260, width);
  const h = figureHeight(width);
  // `build` should be stable (useCallback) so a figure is rebuilt only when its inputs or size change.
  // Staggered: a new result first shows its numbers, then the figures are built and drawn one per
  // task; building and drawing every figure in the store update's own render held the main thread
  // about 200 ms at the end of a run (`npm run bench`, browser part).
  const deferredBuild = useStaggeredValue(build);
  const figure = useMemo(() => deferredBuild({ width: w, height: h }), [deferredBuild, w, h]);
  return (
    <div ref={ref} className="figure-slot">
      {figure.kind === 'figure' ? <ChartFrame model={figure.model} testId={testId} /> : <p className="muted" role="note">{figure.message}</p>}
      {figure.kind === 'figure' && exportId !== undefined && <ExportToolbar model={figure.model} figureId={exportId} caption={exportCaption} />}
    </div>
  );
}
