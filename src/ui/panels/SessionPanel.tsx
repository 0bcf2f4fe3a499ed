import { runner } from '../runner';
import { useAppState } from '../store/store';
import { dataCheckText, savedAtText } from '../store/sessionSlice';

/** Offers a text as a file download; the object URL is released once the click has been handled. */
function download(name: string, text: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: 'application/json' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 0);
}

function save(): void {
  const file = runner.sessionFile();
  if (file !== null) download(file.name, file.text);
}

/** Save the shown analysis as a session file, open one, and whether a later file is the session's data. */
export function SessionPanel() {
  const hasResult = useAppState((s) => s.result !== null);
  const running = useAppState((s) => s.run.status === 'running');
  const session = useAppState((s) => s.session);
  const dataCheck = useAppState((s) => s.dataCheck);
  return (
    <section className="panel" aria-labelledby="session-heading">
      <h2 id="session-heading">Session</h2>
      <div className="button-row">
        <button type="button" className="secondary" onClick={save} disabled={!hasResult || running}>
          Save session
        </button>
        <label className="file-button">
          Open session…
          <input
            type="file"
            accept=".json,application/json"
            className="visually-hidden"
            aria-label="Open a session file"
            onChange={(event) => {
              const file = event.currentTarget.files?.[0];
              if (file !== undefined) void runner.openSession(file);
              event.currentTarget.value = '';
            }}
          />
        </label>
      </div>
      <p className="hint" data-testid="session-status">
        {session === null
          ? 'A session keeps the result, settings and view, with the calibration and the last comparison when there are any, in one JSON file; opening it shows every view without computing.'
          : `Session of “${session.inputName}”, saved ${savedAtText(session.savedAt)}.${session.sha256 === null ? '' : ' Drop the original file to check it is the same data.'}`}
      </p>
      {dataCheck !== null && (
        <p className={`data-check data-check-${dataCheck.kind}`} role="status" data-testid="data-check">
          {dataCheckText(dataCheck)}
        </p>
      )}
    </section>
  );
}
