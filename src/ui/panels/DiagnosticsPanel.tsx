import './statisticsPanels.css';
import { useCallback } from 'react';
import type { DecayFit, DiagnosticsSummary } from '../../core';
import { autocorrelationFigure, mixingFigure, readoutNumber, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { useAppState } from '../store/store';

function FitRow({ name, fit }: { readonly name: string; readonly fit: DecayFit | null }) {
  if (fit === null) {
    return (
      <tr>
        <th scope="row">{name}</th>
        <td colSpan={4}>no fit (fewer than 3 gaps above the noise)</td>
      </tr>
    );
  }
  return (
    <tr>
      <th scope="row">{name}</th>
      <td className="num">{readoutNumber(fit.scale)}</td>
      <td className="num">{readoutNumber(fit.rSquared)}</td>
      <td className="num">{readoutNumber(fit.residualSd)}</td>
      <td>
        k = {fit.gapRange[0]}–{fit.gapRange[1]}
      </td>
    </tr>
  );
}

function MixingView({ d }: { readonly d: DiagnosticsSummary }) {
  const buildBeta = useCallback((size: FigureSize) => mixingFigure(d, size), [d]);
  const buildAcf = useCallback((size: FigureSize) => autocorrelationFigure(d, size), [d]);
  const b = d.beta;
  const m = d.moments;
  return (
    <>
      <p className="plain-note" data-testid="mixing-reading" data-verdict={d.reading.verdict}>
        {d.reading.text}
      </p>
      <p className="hint">{d.reading.caveat}</p>
      <div className="figure-pair">
        <div>
          <FigureSlot build={buildBeta} testId="mixing-figure" exportId="mixing-beta" />
          {b !== null && (
            <>
              <table className="compact" data-testid="decay-fits">
                <caption>Fits of log β(k) over the leading gaps above {b.signalFactor} × the noise floor</caption>
                <thead>
                  <tr>
                    <th scope="col">Decay</th>
                    <th scope="col">τ or rate p</th>
                    <th scope="col">R²</th>
                    <th scope="col">Residual SD (log)</th>
                    <th scope="col">Gaps</th>
                  </tr>
                </thead>
                <tbody>
                  <FitRow name="Exponential C e^(−k/τ)" fit={b.exponential} />
                  <FitRow name="Power law C k^(−p)" fit={b.power} />
                </tbody>
              </table>
            </>
          )}
        </div>
        <div>
          <FigureSlot build={buildAcf} testId="acf-figure" exportId="information-acf" />
        </div>
      </div>
      {m !== null && (
        <>
          <table className="compact" data-testid="information-moments">
            <caption>Raw moments E[I^r] of the one-symbol information I = −log p̂(x), nats^r</caption>
            <thead>
              <tr>
                <th scope="col">r</th>
                <th scope="col">E[I^r]</th>
                <th scope="col">Standard error</th>
                <th scope="col">Tail resolved</th>
              </tr>
            </thead>
            <tbody>
              {m.raw.map((v, i) => (
                <tr key={i}>
                  <td className="num">{i + 1}</td>
                  <td className="num">{readoutNumber(v)}</td>
                  <td className="num">{readoutNumber(m.rawStandardError[i] ?? null)}</td>
                  <td>{m.resolved[i] ? 'yes' : 'no'}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {m.heavyTail && (
            <p className="field-error" role="alert" data-testid="heavy-tail">
              Heavy tail: symbols seen once carry {(100 * m.tailShare).toFixed(0)}% of the variance of −log p̂(x), and about {(100 * m.unseenMass).toPrecision(2)}% of the
              probability is unseen. The variance estimate is unreliable.
            </p>
          )}
          <p className="hint">{m.note}</p>
        </>
      )}
    </>
  );
}

/** Mixing diagnostics of the current result: the reading in words, β(k) with its fits, the ACF, the moments. */
export function DiagnosticsPanel() {
  // Each figure panel takes a new result in its own task (useStaggeredValue).
  const result = useStaggeredValue(useAppState((s) => s.result));
  const d = result?.diagnostics;
  return (
    <section className="panel" aria-labelledby="diagnostics-heading" data-testid="diagnostics-panel">
      <h2 id="diagnostics-heading">Mixing diagnostics</h2>
      {result === null ? (
        <p className="muted">The diagnostics appear with the first result.</p>
      ) : d === undefined ? (
        <p className="muted">This result has no diagnostics (saved before they were added): run the analysis again to see them.</p>
      ) : (
        <MixingView d={d} />
      )}
    </section>
  );
}
