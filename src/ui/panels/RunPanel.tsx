import { runner } from '../runner';
import { useAppState } from '../store/store';
import { progressView } from '../view/progressView';

/** Run and Cancel, the run's state in words, and a progress bar over block lengths n. */
export function RunPanel() {
  const run = useAppState((s) => s.run);
  const view = progressView(run);
  const running = run.status === 'running';
  return (
    <section className="panel" aria-labelledby="run-heading">
      <h2 id="run-heading">Run</h2>
      <div className="button-row">
        <button type="button" onClick={() => void runner.rerun()} disabled={running}>
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
    </section>
  );
}
