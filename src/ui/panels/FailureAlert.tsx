import { dismissFailure, useAppState } from '../store/store';

/** The last run's failure, in words, until dismissed or a new run starts. */
export function FailureAlert() {
  const failure = useAppState((s) => s.failure);
  if (failure === null) return null;
  return (
    <div className="alert" role="alert">
      <div>
        <p className="alert-title">{failure.title}</p>
        <p className="alert-message">{failure.message}</p>
      </div>
      <button type="button" className="quiet" onClick={dismissFailure} aria-label="Dismiss the error message">
        Dismiss
      </button>
    </div>
  );
}
