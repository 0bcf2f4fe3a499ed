import { useCallback, useMemo, useState } from 'react';
import type { AnalysisResult } from '../../core';
import { envelopeFigure, envelopeStatistics, readoutPercent, type EnvelopeField, type EnvelopeOptions, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { resetView, updateView, useAppState } from '../store/store';
import { parseEnvelopeField } from '../view/envelopeInput';

const FIELDS: readonly { field: EnvelopeField; label: string; hint: string }[] = [
  { field: 'z', label: 'z (Gaussian band ±z σ̂ √n)', hint: '1.96 puts 95% inside at each n for a Gaussian.' },
  { field: 'delta', label: 'δ (error term ±C n^(1/2 − δ))', hint: 'From 0 to 0.5.' },
  { field: 'errorC', label: 'C (error term, nats)', hint: 'Above 0.' },
];

function EnvelopeControls({ options }: { readonly options: EnvelopeOptions }) {
  const [texts, setTexts] = useState<Partial<Record<EnvelopeField, string>>>({});
  return (
    <div className="field-row envelope-controls">
      {FIELDS.map(({ field, label, hint }) => {
        const text = texts[field] ?? String(options[field]);
        const parsed = parseEnvelopeField(field, text, options);
        const message = 'message' in parsed ? parsed.message : null;
        const errorId = `envelope-${field}-error`;
        return (
          <label className="field" key={field}>
            <span>{label}</span>
            <input
              type="text"
              inputMode="decimal"
              value={text}
              aria-invalid={message !== null}
              aria-describedby={message !== null ? errorId : undefined}
              onChange={(event) => {
                const next = event.currentTarget.value;
                const p = parseEnvelopeField(field, next, options);
                setTexts((t) => ({ ...t, [field]: next }));
                if ('value' in p) updateView({ [field]: p.value });
              }}
            />
            {message !== null ? (
              <span id={errorId} className="field-error" role="alert">
                {message}
              </span>
            ) : (
              <span className="field-hint">{hint}</span>
            )}
          </label>
        );
      })}
      <button
        type="button"
        className="quiet"
        onClick={() => {
          setTexts({});
          resetView();
        }}
      >
        Reset view options
      </button>
    </div>
  );
}

function EnvelopeView({ result }: { readonly result: AnalysisResult }) {
  const view = useAppState((s) => s.view);
  const options = useMemo<EnvelopeOptions>(() => ({ z: view.z, delta: view.delta, errorC: view.errorC }), [view.z, view.delta, view.errorC]);
  const table = useMemo(() => envelopeStatistics(result, options), [result, options]);
  const build = useCallback((size: FigureSize) => envelopeFigure(result, size, options, table), [result, options, table]);
  const leftOut = table.exceedance.reduce((sum, r) => sum + r.leftOut, 0);
  return (
    <>
      <EnvelopeControls options={options} />
      <FigureSlot build={build} testId="envelope-figure" exportId="envelopes" />
      {table.exceedance.length > 0 && (
        <>
          <p className="hint">
            ĥ = {table.hNats?.toFixed(4)} nat/symbol, σ̂ = {table.sigmaNats === null ? '—' : table.sigmaNats.toFixed(4)} nat per √symbol (the result's estimates). Path
            entries left out as censored or past the end: {leftOut}.
          </p>
          <div className="table-scroll" tabIndex={0} role="region" aria-label="Share of paths outside each band, by block length, scrollable">
            <table className="compact" data-testid="envelope-table">
              <caption>Share of sampled paths outside each band, per block length n up to the last n with a value (paths without a value at n are left out and counted).</caption>
              <thead>
                <tr>
                  <th scope="col">n</th>
                  <th scope="col">Paths used</th>
                  <th scope="col">Left out</th>
                  <th scope="col">Outside ±z σ̂ √n</th>
                  <th scope="col">Outside ±σ̂ √(2 n log log n)</th>
                  <th scope="col">Outside ±C n^(1/2 − δ)</th>
                </tr>
              </thead>
              <tbody>
                {table.exceedance.filter((r) => r.used > 0).map((r) => (
                  <tr key={r.n}>
                    <th scope="row" className="num">
                      {r.n}
                    </th>
                    <td className="num">{r.used}</td>
                    <td className="num">{r.leftOut}</td>
                    <td className="num">{readoutPercent(r.outside.gaussian)}</td>
                    <td className="num">{readoutPercent(r.outside.iteratedLog)}</td>
                    <td className="num">{readoutPercent(r.outside.errorTerm)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </>
  );
}

/** Deviations log R_n(x) − n ĥ with Gaussian, iterated-logarithm and error-term bands, and the share of paths outside each. */
export function EnvelopePanel() {
  // Each figure panel takes a new result in its own task (useStaggeredValue).
  const result = useStaggeredValue(useAppState((s) => s.result));
  return (
    <section className="panel" aria-labelledby="envelope-heading">
      <h2 id="envelope-heading">Envelopes of log R_n − n ĥ</h2>
      {result === null ? <p className="muted">The figure appears with the first result.</p> : <EnvelopeView result={result} />}
    </section>
  );
}
