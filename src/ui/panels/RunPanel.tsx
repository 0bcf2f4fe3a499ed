import { DEMO_SCENARIOS } from '../../../workers/demoScenarios';
import { runner } from '../runner';
import { useAppState } from '../store/store';
import { chosenInputText } from '../view/inputOptions';
import { progressView } from '../view/progressView';
import { useClock } from './useClock';

const demoTitle = (id: string): string => DEMO_SCENARIOS.find((s) => s.id === id)?.title ?? id;
/** The one Run button, Cancel, what the next run reads, and the progress over block lengths n. */
export function RunPanel() {
  const run = useAppState((s) => s.run);
  const chosen = useAppState((s) => s.chosen);
  const running = run.status === 'running';
  const now = useClock(running);
  const view = progressView(run, Math.max(now, running ? run.startedAtMs : now));
  return (
    <section className="panel" aria-labelledby="run-heading">
      <h2 id="run-heading">Run</h2>
      <p className="current-input" data-testid="next-input">
        <span className="muted">Input: </span>
        {chosen === null ? 'the default demo' : chosenInputText(chosen, demoTitle)}
      </p>
      <div className="button-row">
        <button type="button" onClick={() => void runner.run()} disabled={running}>
          Run
        </button>
        <button type="button" className="secondary" onClick={runner.cancel} disabled={!running}>
          Cancel
        </button>
      </div>
      <p className="status" role="status" aria-live="polite">
        <span className={`badge badge-${run.status}`} data-testid="run-status">
          {view.status}
        </span>
        <span>{view.detail}</span>
      </p>
      <progress aria-label="Analysis progress" max={view.max} {...(view.value === null ? {} : { value: view.value })} />
      {view.elapsed !== null && (
        <p className="timing" data-testid="run-timing">
          <span>{view.elapsed}</span>
          {view.timeLeft !== null && <span>{view.timeLeft}</span>}
        </p>
      )}
    </section>
  );
}
