import { useCallback } from 'react';
import type { AnalysisResult } from '../../core';
import { varianceGrowthFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { useAppState } from '../store/store';

function VarianceGrowthFigure({ result }: { readonly result: AnalysisResult }) {
  const build = useCallback((size: FigureSize) => varianceGrowthFigure(result, size), [result]);
  return <FigureSlot build={build} testId="variance-figure" exportId="variance-growth" />;
}

/** Var(log R_n) against n and the fitted line whose slope is the variance-growth estimate of sigma^2. */
export function VarianceGrowthPanel() {
  // Each figure panel takes a new result in its own task (useStaggeredValue).
  const result = useStaggeredValue(useAppState((s) => s.result));
  return (
    <section className="panel" aria-labelledby="variance-heading">
      <h2 id="variance-heading">Growth of Var(log R_n)</h2>
      {result === null ? <p className="muted">The figure appears with the first result.</p> : <VarianceGrowthFigure result={result} />}
    </section>
  );
}
