import './comparePanel.css';
import { useCallback, useState, type DragEvent } from 'react';
import type { ComparisonResult } from '../../core';
import { comparisonCaption, comparisonConvergenceFigure, comparisonQuantileFigure, type FigureSize } from '../../figures';
import { DEMO_SCENARIOS } from '../../../workers/demoScenarios';
import { FigureSlot } from '../charts/FigureSlot';
import { useClock } from './useClock';
import { comparisonRunner } from '../comparisonRunner';
import { useAppState } from '../store/store';
import { comparisonLines, comparisonProgressView, sideText } from '../view/comparisonView';
import { parseDemoLength } from '../view/inputOptions';

/** Gallery entries offered as either side: the reference sources, then the invented stories. */
const REFERENCE = DEMO_SCENARIOS.filter((s) => s.kind === 'reference');
const INVENTED = DEMO_SCENARIOS.filter((s) => s.kind === 'invented');
/** Value of the select's "the input loaded above" choice (side A only). */
const LOADED = 'loaded-input';
function LengthField({ which, length }: { readonly which: 'A' | 'B'; readonly length: number }) {
  const [text, setText] = useState<string | null>(null);
  const shown = text ?? String(length);
  const valid = parseDemoLength(shown) !== null;
  return (
    <label className="field">
      <span>Symbols to generate</span>
      <input
        type="number"
        inputMode="numeric"
        step={1000}
        value={shown}
        aria-invalid={!valid}
        data-testid={`compare-length-${which.toLowerCase()}`}
        onChange={(event) => {
          const value = event.currentTarget.value;
          const parsed = parseDemoLength(value);
          setText(parsed === null ? value : null);
          if (parsed !== null) comparisonRunner.setLength(which, parsed);
        }}
      />
    </label>
  );
}

function SideChooser({ which }: { readonly which: 'A' | 'B' }) {
  const side = useAppState((s) => (which === 'A' ? s.comparisonRun.sideA : s.comparisonRun.sideB));
  const [dragging, setDragging] = useState(false);
  const key = which.toLowerCase();
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    // Keep the page-wide drop (which opens the main input) from taking this file too.
    event.preventDefault();
    event.stopPropagation();
    setDragging(false);
    const file = event.dataTransfer.files[0];
    if (file !== undefined) comparisonRunner.chooseFile(which, file);
  };
  const selected = side?.kind === 'demo' ? side.id : side?.kind === 'input' ? LOADED : '';
  return (
    <fieldset className="compare-side" data-testid={`compare-side-${key}`}>
      <legend>Sequence {which}</legend>
      <div
        className={dragging ? 'drop-zone compare-drop is-dragging' : 'drop-zone compare-drop'}
        onDragOver={(e) => {
          e.preventDefault();
          e.stopPropagation();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        data-testid={`compare-drop-${key}`}
      >
        <p>{dragging ? `Drop the file to use it as ${which}` : `Drop a file for ${which} here`}</p>
        <label className="file-button">
          Choose a file…
          <input
            type="file"
            className="visually-hidden"
            aria-label={`Choose a file for sequence ${which}`}
            data-testid={`compare-file-${key}`}
            onChange={(e) => {
              const file = e.currentTarget.files?.[0];
              if (file !== undefined) comparisonRunner.chooseFile(which, file);
              e.currentTarget.value = '';
            }}
          />
        </label>
      </div>
      <div className="field-row">
        <label className="field">
          <span>Or use</span>
          <select
            data-testid={`compare-source-${key}`}
            value={selected}
            onChange={(e) => {
              const value = e.currentTarget.value;
              if (value === LOADED) comparisonRunner.chooseLoadedInput();
              else if (value !== '') comparisonRunner.chooseDemo(which, value, side?.kind === 'demo' ? side.length : undefined);
            }}
          >
            <option value="">(choose)</option>
            {which === 'A' && <option value={LOADED}>The input loaded above</option>}
            <optgroup label="Reference sources">
              {REFERENCE.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.title}
                </option>
              ))}
            </optgroup>
            <optgroup label="Invented stories">
              {INVENTED.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.title}
                </option>
              ))}
            </optgroup>
          </select>
        </label>
        {(side?.kind === 'demo' || side?.kind === 'source') && <LengthField key={`${side.kind}-${selected}`} which={which} length={side.length} />}
      </div>
      <p className="current-input" data-testid={`compare-chosen-${key}`}>
        <span className="muted">{which}: </span>
        {sideText(side)}
      </p>
    </fieldset>
  );
}

function ComparisonEstimates({ result }: { readonly result: ComparisonResult }) {
  const lines = comparisonLines(result);
  const hasExact = result.exact !== null;
  const level = `${Math.round(result.confidence * 100)}% interval`;
  const cross = lines.find((l) => l.id === 'cross');
  return (
    <>
      <p className="compare-names" data-testid="compare-names">
        A: {result.inputA.name} · B: {result.inputB.name}
      </p>
      <p className="muted">
        {result.inputA.symbols.toLocaleString('en-US')} and {result.inputB.symbols.toLocaleString('en-US')} symbols; unit: {result.unit}.
      </p>
      <div className="headline" data-testid="compare-headline">
        <p className="headline-label">Cross entropy rate H(A, B)</p>
        <p className="headline-value">
          <span>{cross?.estimate ?? '—'}</span> <span className="unit">{result.unit}</span>
        </p>
        <p className="headline-interval">
          {level}: {cross?.interval ?? 'no interval'}
        </p>
      </div>
      <table className="compact compare-table" data-testid="compare-estimates">
        <caption>The three rates ({result.unit})</caption>
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
              <td className="num">{l.estimate}</td>
              <td className="num">{l.interval}</td>
              {hasExact && <td className="num">{l.exact ?? '—'}</td>}
            </tr>
          ))}
        </tbody>
      </table>
      <dl className="facts">
        <dt>Block lengths used</dt>
        <dd>{result.trustedRange === null ? 'none qualified' : `n = ${result.trustedRange.lo} to ${result.trustedRange.hi}`}</dd>
        <dt>Why these</dt>
        <dd>{result.trustedRange?.reason ?? '—'}</dd>
        <dt>Intervals</dt>
        <dd>
          Batch means over {result.pairs} segment pairs (A&apos;s g-th segment waits in B&apos;s g-th segment); the relative entropy&apos;s
          standard error is the sum of the two (conservative).
        </dd>
        {result.exact !== null && (
          <>
            <dt>Exact values</dt>
            <dd>{result.exact.source}</dd>
          </>
        )}
      </dl>
      {result.warnings.length > 0 && (
        <div className="warnings" data-testid="compare-warnings">
          <h3>Warnings</h3>
          <ul>
            {result.warnings.map((w, i) => (
              <li key={`${w.code}-${i}`}>
                <span className="warning-code">{w.code}</span> {w.message}
              </li>
            ))}
          </ul>
        </div>
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
  const now = useClock(running);
  const view = comparisonProgressView(run, Math.max(now, running ? (run.startedAtMs ?? now) : now));
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
      <div className="button-row">
        <button type="button" data-testid="compare-run" onClick={() => void comparisonRunner.compare()} disabled={running}>
          Compare
        </button>
        <button type="button" className="secondary" data-testid="compare-cancel" onClick={comparisonRunner.cancel} disabled={!running}>
          Stop comparing
        </button>
      </div>
      <p className="status" aria-live="polite" data-testid="compare-progress">
        <span className={`badge badge-${run.status}`}>{view.status}</span>
        <span>{view.detail}</span>
      </p>
      <progress aria-label="Comparison progress" max={view.max} {...(view.value === null ? {} : { value: view.value })} />
      {view.elapsed !== null && (
        <p className="timing" data-testid="compare-timing">
          <span>{view.elapsed}</span>
        </p>
      )}
      {run.message !== null && (
        <p role={run.status === 'failed' ? 'alert' : 'status'} className={run.status === 'failed' ? 'field-error' : 'hint'} data-testid="compare-message">
          {run.message}
        </p>
      )}
      {result === null ? <p className="muted">The estimates appear after the first comparison.</p> : <ComparisonEstimates result={result} />}
      {result !== null && <ComparisonFigures result={result} />}
    </section>
  );
}
