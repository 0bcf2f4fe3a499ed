import { useMemo, useState } from 'react';
import { calibrationBelongsTo } from '../../core';
import type { AnalysisResult } from '../../core';
import { downloadBlob } from '../../export/downloadBlob';
import { exportFileName } from '../../export/exportFileName';
import { reportHtml } from '../../figures';
import { useAppState } from '../store/store';
import { summaryView } from '../view/summaryView';
import { cautionColumns, physiologicalCaution } from '../view/cautionView';

function Summary({ result, stale }: { readonly result: AnalysisResult; readonly stale: boolean }) {
  const v = useMemo(() => summaryView(result), [result]);
  const csvColumn = useAppState((s) => s.reading.csvColumn);
  const columns = useMemo(() => cautionColumns(result.input.format, csvColumn), [result.input.format, csvColumn]);
  const caution = physiologicalCaution(result.input, columns);
  return (
    <>
      <p className="input-name">{v.inputName}</p>
      <p className="muted">{v.inputLine}</p>
      {caution !== null && (
        <p className="caution-note" role="note" data-testid="physiological-caution">
          {caution}
        </p>
      )}
      {stale && <p className="hint">A new run is in progress; this is the previous result.</p>}
      <div className="headline" data-testid="headline">
        <p className="headline-label">Entropy rate h</p>
        <p className="headline-value">
          <span data-testid="entropy-estimate" data-value={String(result.entropy.estimate)}>
            {v.entropy.value}
          </span>{' '}
          <span className="unit">{v.entropy.unit}</span>
        </p>
        <p className="headline-interval" data-testid="entropy-interval">
          {v.confidenceLabel}: {v.entropy.low} to {v.entropy.high}
        </p>
        {v.entropy.perSecond !== null && (
          <p className="muted">
            {v.entropy.perSecond.value} {v.entropy.perSecond.unit} ({v.entropy.perSecond.low} to {v.entropy.perSecond.high})
          </p>
        )}
      </div>
      <dl className="facts">
        <dt>σ², variance rate of log R_n</dt>
        <dd data-testid="sigma2">
          {v.sigma2.value} {v.sigma2.unit}{' '}
          <span className="muted">
            ({v.confidenceLabel}: {v.sigma2.low} to {v.sigma2.high})
          </span>
          {v.sigma2.negligible && <span className="muted"> · negligible against the exponential-law spread</span>}
        </dd>
        <dt>Block lengths used</dt>
        <dd>{v.lengths}</dd>
        <dt>Why these</dt>
        <dd>{v.reason}</dd>
        <dt>Method</dt>
        <dd>
          h: {v.entropy.method}; σ²: {v.sigma2.method}
        </dd>
        {v.reference !== null && (
          <>
            <dt>Generator’s exact values</dt>
            <dd>
              h = {v.reference.entropy}; σ² = {v.reference.sigma2}
            </dd>
          </>
        )}
      </dl>
      {v.alternatives.length > 0 && (
        <table className="compact">
          <caption>Other estimators of h ({v.entropy.unit})</caption>
          <thead>
            <tr>
              <th scope="col">Estimator</th>
              <th scope="col">Estimate</th>
              <th scope="col">{v.confidenceLabel}</th>
              <th scope="col">Lengths</th>
            </tr>
          </thead>
          <tbody>
            {v.alternatives.map((a) => (
              <tr key={a.key} title={a.note}>
                <th scope="row">{a.label}</th>
                <td className="num">{a.estimate}</td>
                <td className="num">{a.interval}</td>
                <td>{a.lengths}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      {v.warnings.length > 0 && (
        <div className="warnings">
          <h3>Warnings</h3>
          <ul>
            {v.warnings.map((w, k) => (
              <li key={`${w.code}-${k}`}>
                <span className="warning-code">{w.code}</span> {w.message}
              </li>
            ))}
          </ul>
        </div>
      )}
      <ReportButton result={result} columns={columns} />
    </>
  );
}

/** Saves the one-file HTML report of the shown result, with the figures as the page's view options shape them,
 * and the calibration when it belongs to the shown result. */
function ReportButton({ result, columns }: { readonly result: AnalysisResult; readonly columns: readonly string[] }) {
  const view = useAppState((s) => s.view);
  const calibrated = useAppState((s) => s.calibration?.result ?? null);
  const [problem, setProblem] = useState<string | null>(null);
  const save = () => {
    setProblem(null);
    try {
      const calibration = calibrated !== null && calibrationBelongsTo(calibrated, result) ? calibrated : null;
      const html = reportHtml(result, { date: new Date().toISOString(), view, columns, calibration });
      downloadBlob(new Blob([html], { type: 'text/html' }), exportFileName(result.input.name, 'report', 'html'));
    } catch (e) {
      setProblem(`The report could not be made: ${e instanceof Error ? e.message : String(e)}`);
    }
  };
  return (
    <div className="report-action">
      <button type="button" onClick={save}>
        Download report
      </button>
      {problem !== null && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
    </div>
  );
}

/** The headline h with its interval, sigma^2, the range of n used and why, the other estimators and warnings. */
export function SummaryPanel() {
  const result = useAppState((s) => s.result);
  const running = useAppState((s) => s.run.status === 'running');
  return (
    <section className="panel summary" aria-labelledby="summary-heading" aria-busy={running}>
      <h2 id="summary-heading">Estimate</h2>
      {result === null ? (
        <p className="muted">{running ? 'Working on the first result…' : 'No result yet: choose a file or run the demo.'}</p>
      ) : (
        <Summary result={result} stale={running} />
      )}
    </section>
  );
}
