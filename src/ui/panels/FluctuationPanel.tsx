import './statisticsPanels.css';
import { useCallback, useMemo, useState } from 'react';
import type { AnalysisResult } from '../../core';
import {
  clampViewLength,
  fluctuationHistogramFigure,
  fluctuationQuantileFigure,
  fluctuationStatistics,
  pValueText,
  readoutNumber,
  viewLengthRange,
  type FigureSize,
  type FluctuationStatistics,
} from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { updateView, useAppState } from '../store/store';
import { parseGap } from '../view/gapInput';
import { LengthSlider } from './LengthSlider';
import { ReturnLawFigureAndNumbers } from './ReturnLawPanel';

function GapField({ gap }: { readonly gap: number }) {
  const [text, setText] = useState<string | null>(null);
  const shown = text ?? String(gap);
  const parsed = parseGap(shown);
  const message = 'message' in parsed ? parsed.message : null;
  return (
    <label className="field gap-field">
      <span>Gap between kept positions (symbols)</span>
      <input
        type="text"
        inputMode="numeric"
        value={shown}
        aria-invalid={message !== null}
        aria-describedby={message !== null ? 'fluctuation-gap-error' : 'fluctuation-gap-hint'}
        onChange={(event) => {
          const next = event.currentTarget.value;
          setText(next);
          const p = parseGap(next);
          if ('value' in p) updateView({ fluctuationGap: p.value });
        }}
      />
      {message !== null ? (
        <span id="fluctuation-gap-error" className="field-error" role="alert">
          {message}
        </span>
      ) : (
        <span id="fluctuation-gap-hint" className="field-hint">
          1 keeps every sampled position; larger values thin them.
        </span>
      )}
    </label>
  );
}

function TestNumbers({ statistics }: { readonly statistics: FluctuationStatistics }) {
  const f = statistics.fluctuations;
  const t = statistics.tests;
  return (
    <>
      <dl className="statistics" data-testid="fluctuation-statistics">
        <div>
          <dt>Values used / censored / thinned</dt>
          <dd data-testid="fluctuation-counts">{f === null ? '—' : `${f.values.length} / ${f.missing} / ${f.thinned}`}</dd>
        </div>
        <div>
          <dt>Kolmogorov-Smirnov D (p)</dt>
          <dd data-testid="fluctuation-ks">{t === null ? '—' : `${readoutNumber(t.kolmogorovSmirnov.statistic)} (p ${pText(t.kolmogorovSmirnov.pValue)})`}</dd>
        </div>
        <div>
          <dt>Anderson-Darling A² (p)</dt>
          <dd data-testid="fluctuation-ad">{t === null ? '—' : `${readoutNumber(t.andersonDarling.statistic)} (p ${pText(t.andersonDarling.pValue)})`}</dd>
        </div>
      </dl>
      {statistics.hNats !== null && statistics.sigmaNats !== null && (
        <p className="hint">
          Normalized with the result's ĥ = {readoutNumber(statistics.hNats)} nat/symbol and σ̂ = {readoutNumber(statistics.sigmaNats)} nat per √symbol.{' '}
          {t?.caveat ?? ''} Thinning with a gap well above e^(n ĥ) makes them closer to independent, at the cost of fewer values.
        </p>
      )}
    </>
  );
}

/** 'p = 0.12' or 'p < 1e-4'. */
function pText(p: number): string {
  const text = pValueText(p);
  return text.startsWith('<') ? text : `= ${text}`;
}

function FluctuationView({ result }: { readonly result: AnalysisResult }) {
  const chosen = useAppState((s) => s.view.fluctuationN);
  const gap = useAppState((s) => s.view.fluctuationGap);
  const range = useMemo(() => viewLengthRange(result), [result]);
  const n = clampViewLength(result, chosen);
  const statistics = useMemo(() => fluctuationStatistics(result, n, gap), [result, n, gap]);
  const quantile = useCallback((size: FigureSize) => fluctuationQuantileFigure(statistics, size), [statistics]);
  const histogram = useCallback((size: FigureSize) => fluctuationHistogramFigure(statistics, size), [statistics]);
  const slider = (
    <LengthSlider label="Block length n for the fluctuations" value={n} range={range} onChange={(v) => updateView({ fluctuationN: v })} testId="fluctuation-n" />
  );
  if (statistics.negligible) {
    return (
      <>
        <p className="plain-note" role="note" data-testid="fluctuation-negligible">
          {statistics.problem}
        </p>
        {slider}
        <ReturnLawFigureAndNumbers result={result} n={n} testId="fluctuation-return-law-figure" />
      </>
    );
  }
  return (
    <>
      <div className="field-row statistics-controls">
        {slider}
        <GapField gap={gap} />
      </div>
      {statistics.problem !== null ? (
        <p className="muted" role="note">
          {statistics.problem}
        </p>
      ) : (
        <div className="figure-pair">
          <FigureSlot build={quantile} testId="fluctuation-qq-figure" exportId="fluctuations-qq" />
          <FigureSlot build={histogram} testId="fluctuation-histogram-figure" exportId="fluctuations-histogram" />
        </div>
      )}
      <TestNumbers statistics={statistics} />
    </>
  );
}

/** Normalized fluctuations of log R_n at one n against N(0,1): Q-Q plot, histogram and two goodness-of-fit tests. */
export function FluctuationPanel() {
  // Each figure panel takes a new result in its own task (useStaggeredValue).
  const result = useStaggeredValue(useAppState((s) => s.result));
  return (
    <section className="panel" aria-labelledby="fluctuation-heading">
      <h2 id="fluctuation-heading">Fluctuations against the Gaussian</h2>
      {result === null ? <p className="muted">The figures appear with the first result.</p> : <FluctuationView result={result} />}
    </section>
  );
}
