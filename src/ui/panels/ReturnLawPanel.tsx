import './statisticsPanels.css';
import { useCallback, useMemo } from 'react';
import type { AnalysisResult } from '../../core';
import { clampViewLength, readoutNumber, returnLawFigure, returnLawStatistics, viewLengthRange, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { updateView, useAppState } from '../store/store';
import { LengthSlider } from './LengthSlider';

/** The return law at block length n: the figure and its numbers. Also shown by the fluctuation panel when σ̂² is negligible. */
export function ReturnLawFigureAndNumbers({ result, n, testId }: { readonly result: AnalysisResult; readonly n: number; readonly testId: string }) {
  const statistics = useMemo(() => returnLawStatistics(result, n), [result, n]);
  const build = useCallback((size: FigureSize) => returnLawFigure(statistics, size), [statistics]);
  const law = statistics.law;
  return (
    <>
      <FigureSlot build={build} testId={testId} exportId="return-law" />
      {law !== null && law.size > 0 && (
        <>
          <dl className="statistics" data-testid={`${testId}-statistics`}>
            <div>
              <dt>Samples used</dt>
              <dd>
                {law.size} ({law.events} returns, {law.censored} censored)
              </dd>
            </div>
            <div>
              <dt>Left out (no return, no bound)</dt>
              <dd>{law.missing}</dd>
            </div>
            <div>
              <dt>Mean of log t (± standard error)</dt>
              <dd>
                {readoutNumber(law.meanLog)} ± {readoutNumber(law.meanLogStandardError)}; Exp(1): −γ = {readoutNumber(law.expectedMeanLog)}
              </dd>
            </div>
            <div>
              <dt>Kolmogorov-Smirnov distance to e^(−s)</dt>
              <dd>{readoutNumber(law.ksDistance)}</dd>
            </div>
          </dl>
          <p className="hint">
            t = R_n × (count of the block) / (N − n + 1) with N = {result.input.symbols} symbols; for a well-mixing source t is close to Exp(1), so the
            survival curve should follow the straight line e^(−s) on this scale. Censored returns enter as right-censored. {law.caveat}
          </p>
        </>
      )}
    </>
  );
}

function ReturnLawView({ result }: { readonly result: AnalysisResult }) {
  const chosen = useAppState((s) => s.view.returnLawN);
  const range = useMemo(() => viewLengthRange(result), [result]);
  const n = clampViewLength(result, chosen);
  return (
    <>
      <LengthSlider label="Block length n for the return law" value={n} range={range} onChange={(v) => updateView({ returnLawN: v })} testId="return-law-n" />
      <ReturnLawFigureAndNumbers result={result} n={n} testId="return-law-figure" />
    </>
  );
}

/** Kaplan-Meier survival of R_n times the block frequency against the Exp(1) law, at one chosen n. */
export function ReturnLawPanel() {
  // Each figure panel takes a new result in its own task (useStaggeredValue).
  const result = useStaggeredValue(useAppState((s) => s.result));
  return (
    <section className="panel" aria-labelledby="return-law-heading">
      <h2 id="return-law-heading">Return law at one block length</h2>
      {result === null ? <p className="muted">The figure appears with the first result.</p> : <ReturnLawView result={result} />}
    </section>
  );
}
