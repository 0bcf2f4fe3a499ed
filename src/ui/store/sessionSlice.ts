import type { Session } from '../../core';
import { calibrationRunOfResult } from './calibrationSlice';
import { restoreReading } from './inputSlice';
import { describeFailure } from './runSlice';
import { restoreSettings } from './settingsSlice';
import type { StoreHandle } from './store';
import { restoreView } from './viewSlice';

/** The session shown on the page, as far as the data check needs it. */
export interface OpenedSession {
  readonly savedAt: string;
  readonly inputName: string;
  /** SHA-256 of the session's input; null for a generated demo. */
  readonly sha256: string | null;
}

/** Whether a file opened after the session holds the session's data, by SHA-256. */
export type DataCheck =
  | { readonly kind: 'checking'; readonly name: string }
  | { readonly kind: 'same'; readonly name: string }
  | { readonly kind: 'different'; readonly name: string }
  | { readonly kind: 'unknown'; readonly name: string; readonly reason: string };

export interface SessionState {
  readonly session: OpenedSession | null;
  readonly dataCheck: DataCheck | null;
}

export const initialSessionState: SessionState = { session: null, dataCheck: null };

/** "2026-12-01 10:00 UTC": the saved time, the same on every machine. */
export function savedAtText(savedAt: string): string {
  const date = new Date(savedAt);
  return Number.isNaN(date.getTime()) ? savedAt : `${date.toISOString().slice(0, 16).replace('T', ' ')} UTC`;
}

/** What the page says about a data check. */
export function dataCheckText(check: DataCheck): string {
  switch (check.kind) {
    case 'checking':
      return `Checking whether “${check.name}” is the session's data…`;
    case 'same':
      return `“${check.name}”: same data as the session (SHA-256 matches).`;
    case 'different':
      return `“${check.name}” is different data from the session's (SHA-256 differs).`;
    case 'unknown':
      return `“${check.name}” could not be compared with the session: ${check.reason}.`;
  }
}

export function sessionActions(store: StoreHandle) {
  return {
    /** Shows a saved session: its result, settings, reading choices and view, its calibration and
     * comparison (or none, for a session without them), without computing. */
    openSession(session: Session): void {
      const { input } = session.result;
      store.setState({
        result: session.result,
        pathsDropped: false,
        settings: restoreSettings(session.settings),
        reading: restoreReading(session.reading),
        view: restoreView(session.view),
        run: { status: 'idle', note: `Opened session saved ${savedAtText(session.savedAt)}.` },
        failure: null,
        partial: null,
        session: { savedAt: session.savedAt, inputName: input.name, sha256: input.sha256 },
        dataCheck: null,
        calibration: session.calibration === undefined ? null : calibrationRunOfResult(session.calibration, session.result.entropy),
        comparisonResult: session.comparison ?? null,
      });
    },
    /** A session file that could not be opened: its reason in the failure alert; the page stays as it was. */
    sessionFailed(fileName: string, error: unknown): void {
      store.setState({ failure: { ...describeFailure(error, `“${fileName}”`), title: `Could not open the session “${fileName}”` } });
    },
    /** Compares a file's SHA-256 (null: not known) with the open session's; nothing happens without a session. */
    checkData(name: string, sha256: string | null | 'checking', reason = 'its checksum could not be computed'): void {
      const { session } = store.getState();
      if (session === null || session.sha256 === null) return;
      const dataCheck: DataCheck =
        sha256 === 'checking'
          ? { kind: 'checking', name }
          : sha256 === null
            ? { kind: 'unknown', name, reason }
            : { kind: sha256 === session.sha256 ? 'same' : 'different', name };
      store.setState({ dataCheck });
    },
  };
}
