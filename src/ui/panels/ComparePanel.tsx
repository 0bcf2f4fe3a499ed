import { useCallback, type DragEvent } from 'react';
import { sourceCatalog, type ComparisonResult } from '../../core';
import { comparisonCaption, comparisonConvergenceFigure, comparisonQuantileFigure, type FigureSize } from '../../figures';
import { FigureSlot } from '../charts/FigureSlot';
import { comparisonRunner } from '../comparisonRunner';
import { useAppState } from '../store/store';
import { comparisonLines, comparisonProgressText, sideText } from '../view/comparisonView';

/** Reference sources offered as either side (the gallery's catalog). */
const SOURCES = sourceCatalog().map((s) => ({ id: s.id, label: s.label }));

function SideChooser({ which }: { readonly which: 'A' | 'B' }) {
  const side = useAppState((s) => (which === 'A' ? s.comparisonRun.sideA : s.comparisonRun.sideB));
  const key = which.toLowerCase();
  const onDrop = (event: DragEvent<HTMLFieldSetElement>) => {
    // Keep the page-wide drop (which opens the main input) from taking this file too.
    event.preventDefault();
    event.stopPropagation();
    const file = event.dataTransfer.files[0];
    if (file !== undefined) comparisonRunner.chooseFile(which, file);
  };
  return (
    <fieldset className="compare-side" onDragOver={(e) => e.preventDefault()} onDrop={onDrop} data-testid={`compare-side-${key}`}>
      <legend>Sequence {which}</legend>
      <label>
        File (pick or drop here){' '}
        <input
          type="file"
          data-testid={`compare-file-${key}`}
          onChange={(e) => {
            const file = e.currentTarget.files?.[0];
            if (file !== undefined) comparisonRunner.chooseFile(which, file);
          }}
        />
      </label>
      <label>
        or a reference source{' '}
        <select
          data-testid={`compare-source-${key}`}
          value={side?.kind === 'source' ? side.spec : ''}
          onChange={(e) => {
            const chosen = SOURCES.find((s) => s.id === e.currentTarget.value);
            if (chosen !== undefined) comparisonRunner.chooseSource(which, chosen.id, chosen.label);
          }}
        >
          <option value="">(choose)</option>
          {SOURCES.map((s) => (
            <option key={s.id} value={s.id}>
              {s.label}
            </option>
          ))}
        </select>
      </label>
      <p className="muted" data-testid={`compare-chosen-${key}`}>
        {sideText(side)}
      </p>
    </fieldset>
  );
}

function ComparisonEstimates({ result }: { readonly result: ComparisonResult }) {
  const lines = comparisonLines(result);
  const hasExact = result.exact !== null;
  const level = `${Math.round(result.confidence * 100)}% interval`;
  return (
    <>
      <p>
        A: {result.inputA.name} ({result.inputA.symbols.toLocaleString('en-US')} symbols); B: {result.inputB.name} (
        {result.inputB.symbols.toLocaleString('en-US')} symbols). Unit: {result.unit}.
      </p>
      <table className="compare-table" data-testid="compare-estimates">
        <thead>
          <tr>
            <th scope="col">Rate</th>
            <th scope="col">Estimate</th>
            <th scope="col">{level}</th>
            {hasExact && <th scope="col">Exact</th>}
          </tr>
        </thead>
        <tbody>
          {lines.map((l) => (
            <tr key={l.id} data-testid={`compare-${l.id}`} title={l.note}>
              <th scope="row">{l.label}</th>
              <td>{l.estimate}</td>
              <td>{l.interval}</td>
              {hasExact && <td>{l.exact ?? '—'}</td>}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="muted">
        {result.trustedRange === null ? 'No trusted block lengths.' : `Block lengths ${result.trustedRange.lo}–${result.trustedRange.hi}; `}
        intervals by batch means over {result.pairs} segment pairs (A&apos;s g-th segment waits in B&apos;s g-th segment); the relative
        entropy&apos;s standard error is the sum of the two (conservative).
      </p>
      {result.warnings.length > 0 && (
        <ul className="warnings" data-testid="compare-warnings">
          {result.warnings.map((w, i) => (
            <li key={`${w.code}-${i}`}>{w.message}</li>
          ))}
        </ul>
      )}
    </>
  );
}

function ComparisonFigures({ result }: { readonly result: ComparisonResult }) {
  const convergence = useCallback((size: FigureSize) => comparisonConvergenceFigure(result, size), [result]);
  const quantiles = useCallback((size: FigureSize) => comparisonQuantileFigure(result, size), [result]);
  return (
    <>
      <FigureSlot build={convergence} testId="compare-convergence-figure" exportId="compare-convergence" exportCaption={comparisonCaption('compare-convergence', result)} />
      <FigureSlot build={quantiles} testId="compare-qq-figure" exportId="compare-qq" exportCaption={comparisonCaption('compare-qq', result)} />
    </>
  );
}

/**
 * Two sequences: cross entropy rate of A against B from waiting times, h(A) and the relative entropy
 * rate with intervals, the convergence of mean log W_n / n and the fluctuation Q-Q plot.
 */
export function ComparePanel() {
  const run = useAppState((s) => s.comparisonRun);
  const result = useAppState((s) => s.comparisonResult);
  const running = run.status === 'running';
  return (
    <section className="panel" aria-labelledby="compare-heading" data-testid="compare-panel">
      <h2 id="compare-heading">Compare two sequences</h2>
      <p className="muted">
        How well does B predict A? The waiting time W_n of each n-block of A in B grows like e^(n H(A, B)), H the cross entropy rate;
        minus A&apos;s own entropy rate it gives the relative entropy rate. Reading choices of the Input panel apply to both files.
      </p>
      <div className="compare-sides">
        <SideChooser which="A" />
        <SideChooser which="B" />
      </div>
      <div className="buttons">
        <button type="button" data-testid="compare-run" onClick={() => void comparisonRunner.compare()} disabled={running}>
          Compare
        </button>
        <button type="button" className="secondary" data-testid="compare-cancel" onClick={comparisonRunner.cancel} disabled={!running}>
          Stop comparing
        </button>
      </div>
      {running && (
        <p role="status" data-testid="compare-progress">
          {comparisonProgressText(run.progress)}
        </p>
      )}
      {run.message !== null && (
        <p role={run.status === 'failed' ? 'alert' : 'status'} data-testid="compare-message">
          {run.message}
        </p>
      )}
      {result === null ? <p className="muted">The estimates appear after the first comparison.</p> : <ComparisonEstimates result={result} />}
      {result !== null && <ComparisonFigures result={result} />}
    </section>
  );
}
