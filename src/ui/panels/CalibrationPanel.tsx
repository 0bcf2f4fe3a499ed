import { useCallback, useMemo } from 'react';
import type { CalibrationResult } from '../../core';
import { calibrationCaption, calibrationFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { calibrationRunner, MAX_PAGE_REPLICATES } from '../calibrationRunner';
import { setCalibrationReplicates, useAppState } from '../store/store';
import { calibrationView } from '../view/calibrationView';

function CalibrationFigure({ result }: { readonly result: CalibrationResult }) {
  const build = useCallback((size: FigureSize) => calibrationFigure(result, size, 'entropy'), [result]);
  const shown = useAppState((s) => s.result);
  const caption = useMemo(() => calibrationCaption(result, shown), [result, shown]);
  return <FigureSlot build={build} testId="calibration-figure" exportId="calibration" exportCaption={caption} />;
}

/**
 * "Calibrate at this N": surrogates of a Markov chain fitted to the data, analysed like the data, and
 * how their estimates fall around the chain's exact h and sigma^2.
 */
export function CalibrationPanel() {
  const result = useAppState((s) => s.result);
  const running = useAppState((s) => s.run.status === 'running');
  const calibration = useAppState((s) => s.calibration);
  const replicates = useAppState((s) => s.calibrationReplicates);
  const v = calibration === null ? null : calibrationView(calibration, result);
  const busy = v?.running === true;
  return (
    <section className="panel" aria-labelledby="calibration-heading" aria-busy={busy}>
      <h2 id="calibration-heading">Calibration at this N</h2>
      <p className="muted">
        Fits a Markov chain to the data (order chosen by BIC), analyses surrogates of the same length from it with the same settings, and
        compares their estimates with the chain&apos;s exact h and σ².
      </p>
      <div className="button-row">
        <label>
          Replicates{' '}
          <input
            type="number"
            min={10}
            max={MAX_PAGE_REPLICATES}
            step={1}
            value={replicates}
            disabled={busy}
            aria-label="Number of replicates"
            onChange={(e) => setCalibrationReplicates(Number(e.target.value))}
          />
        </label>
        <button type="button" onClick={() => void calibrationRunner.start()} disabled={busy || running || result === null}>
          Calibrate at this N
        </button>
        <button type="button" className="secondary" onClick={calibrationRunner.cancel} disabled={!busy}>
          Stop calibrating
        </button>
      </div>
      {v === null ? (
        <p className="muted">{result === null ? 'Run an analysis first.' : 'No calibration yet for this result.'}</p>
      ) : (
        <>
          <p className="status" role="status" aria-live="polite" data-testid="calibration-progress">
            {v.progress}
          </p>
          <progress aria-label="Calibration progress" max={v.total} value={v.done} />
          {v.stale && (
            <p className="field-error" data-testid="calibration-stale">
              This calibration belongs to an earlier result (another input or other settings): calibrate again for the shown one.
            </p>
          )}
          {v.message !== null && (
            <p className={v.partial ? 'muted' : 'field-error'} role="note" data-testid="calibration-message">
              {v.message}
            </p>
          )}
          {v.model !== null && <p data-testid="calibration-model">{v.model}</p>}
          {v.rows.length > 0 && (
            <table className="compact" data-testid="calibration-table">
              <caption>Surrogate estimates against the fitted chain{v.partial ? ' (partial)' : ''}</caption>
              <thead>
                <tr>
                  <th scope="col">Quantity</th>
                  <th scope="col">Exact</th>
                  <th scope="col">Mean</th>
                  <th scope="col">Bias ± SE</th>
                  <th scope="col">Spread (SD)</th>
                  <th scope="col">Coverage ± SE</th>
                </tr>
              </thead>
              <tbody>
                {v.rows.map((r) => (
                  <tr key={r.name}>
                    <th scope="row">{r.name}</th>
                    <td className="num">{r.exact}</td>
                    <td className="num">{r.mean}</td>
                    <td className="num">{r.bias}</td>
                    <td className="num">{r.spread}</td>
                    <td className="num">{r.coverage}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          {v.corrected !== null && (
            <p data-testid="calibration-corrected">
              <strong>Corrected h = {v.corrected.value}</strong>, {v.corrected.interval}. <span className="muted">{v.corrected.label}.</span>
            </p>
          )}
          {calibration?.result != null && <CalibrationFigure result={calibration.result} />}
        </>
      )}
    </section>
  );
}
