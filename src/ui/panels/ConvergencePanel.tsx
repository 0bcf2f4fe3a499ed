import { useCallback, useMemo } from 'react';
import { convergenceDataOfResult, convergenceFigureOfRows, partialConvergenceData, type ConvergenceData, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredRun } from './useStaggeredRun';
import { updateView, useAppState } from '../store/store';
import { partialLabel } from '../view/partialLabel';

function ConvergenceFigure({ data, label }: { readonly data: ConvergenceData; readonly label: string | null }) {
  const showPaths = useAppState((s) => s.view.showPaths);
  const build = useCallback((size: FigureSize) => convergenceFigureOfRows(data, size, { showPaths }), [data, showPaths]);
  return (
    <>
      {label !== null && (
        <p className="partial-note" data-testid="convergence-partial">
          {label}
        </p>
      )}
      <label className="check">
        <input type="checkbox" checked={showPaths} onChange={(event) => updateView({ showPaths: event.currentTarget.checked })} />
        Show sampled paths
      </label>
      <FigureSlot build={build} testId="convergence-figure" exportId={label === null ? 'convergence' : undefined} />
    </>
  );
}

/** log R_n / n against n, with the mean, quantile bands and the block-entropy references; it fills in
 * level by level while a run goes, and the run's result replaces it. */
export function ConvergencePanel() {
  const { result, partial } = useStaggeredRun();
  const data = useMemo(() => {
    if (partial !== null) return partialConvergenceData(partial.rows, partial.unit, partial.maxN);
    return result === null ? null : convergenceDataOfResult(result);
  }, [partial, result]);
  return (
    <section className="panel" aria-labelledby="convergence-heading" aria-busy={partial?.status === 'running'}>
      <h2 id="convergence-heading">Convergence of log R_n / n</h2>
      {data === null ? <p className="muted">The figure appears with the first result.</p> : <ConvergenceFigure data={data} label={partial === null ? null : partialLabel(partial)} />}
    </section>
  );
}
