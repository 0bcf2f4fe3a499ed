import { useCallback } from 'react';
import type { AnalysisResult } from '../../core';
import { convergenceFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { updateView, useAppState } from '../store/store';

function ConvergenceFigure({ result }: { readonly result: AnalysisResult }) {
  const showPaths = useAppState((s) => s.view.showPaths);
  const build = useCallback((size: FigureSize) => convergenceFigure(result, size, { showPaths }), [result, showPaths]);
  return (
    <>
      <label className="check">
        <input type="checkbox" checked={showPaths} onChange={(event) => updateView({ showPaths: event.currentTarget.checked })} />
        Show sampled paths
      </label>
      <FigureSlot build={build} testId="convergence-figure" />
    </>
  );
}

/** log R_n(x) / n against n, with the mean, quantile bands and the block-entropy references. */
export function ConvergencePanel() {
  const result = useAppState((s) => s.result);
  return (
    <section className="panel" aria-labelledby="convergence-heading">
      <h2 id="convergence-heading">Convergence of log R_n / n</h2>
      {result === null ? <p className="muted">The figure appears with the first result.</p> : <ConvergenceFigure result={result} />}
    </section>
  );
}
