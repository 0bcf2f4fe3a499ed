import { calibrationBelongsTo, looksLikeSession, PREVIEW_BYTES, previewHead, readSession, sessionOf, SNIFF_BYTES, writeSession } from '../core';
import type { AnalysisResult, AnalysisSettings, LengthRow } from '../core';
import { demoScenario } from '../../workers/demoScenarios';
import type { AnalysisClient, AnalysisProgress, CallOptions } from './analysisClient';
import type { CalibrationInput } from './calibrationClient';
import { createAnalysisClient } from './analysisClient';
import { fileSha256 } from './fileDigest';
import { DEFAULT_DEMO } from './store/inputSlice';
import { previewOptionsFor, readerOptionsFor } from './view/inputOptions';
import { sessionFileName } from './view/sessionFileName';
import { appStore, bindActions } from './store/store';
import type { StoreHandle } from './store/store';

/** Chooses inputs, previews files and starts and stops analyses; the only code that talks to the analysis client. */
export interface Runner {
  /** Makes the file the next run's input and previews its head with the current reading choices; nothing runs yet. */
  openFile(file: File): Promise<void>;
  /** Previews the open file's head again, after the reading choices changed. */
  refreshPreview(): void;
  /** Makes a gallery entry the next run's input, at the current demo length and the entry's seed. */
  chooseDemo(id: string): void;
  /** Runs the chosen input with the current settings (the default demo when nothing is chosen). */
  run(): Promise<void>;
  /** Stops the running analysis, if any. */
  cancel(): void;
  /** Opens a saved session file: every view from its result, no computing; bad files get a message. */
  openSession(file: File): Promise<void>;
  /** The shown result as a session file (name and JSON text), or null when there is no result. */
  sessionFile(savedAt?: Date): { name: string; text: string } | null;
  /** The input of the shown result (the File and its reading options, or the demo), while this page
   * still holds it; null after a reload or an opened session. The calibration reads it again. */
  calibrationInput(): CalibrationInput | null;
  /** What the next run would read: the open File, or the chosen demo at the current demo length (the
   * default demo when nothing is chosen); null when the chosen file is no longer held (after a reload). */
  currentInput(): CurrentInput | null;
}

/** The Input panel's current input, for other runners (the comparison takes it as sequence A). */
export type CurrentInput =
  | { readonly kind: 'file'; readonly file: File }
  | { readonly kind: 'demo'; readonly id: string; readonly length: number; readonly seed: number };

/** Bytes of a file's head searched for a session's schema field; the writer puts it first. */
const SESSION_HEAD_BYTES = 256;

/** What a run listens to while it goes: progress and the finished rows of the per-n table. */
type Listeners = Pick<CallOptions, 'onProgress' | 'onRows'>;
type Call = (signal: AbortSignal, listeners: Listeners, settings: AnalysisSettings) => Promise<AnalysisResult>;

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}

export function createRunner(client: AnalysisClient, store: StoreHandle): Runner {
  const actions = bindActions(store);
  let controller: AbortController | null = null;
  let file: File | null = null;
  let head: Uint8Array | null = null;
  /** The input of the last finished run and its result, for the calibration. */
  let lastRun: { input: CalibrationInput; result: AnalysisResult } | null = null;

  const execute = async (label: string, call: Call, input: () => CalibrationInput | null = () => null): Promise<void> => {
    controller?.abort();
    const own = new AbortController();
    controller = own;
    const { settings } = store.getState();
    const id = actions.beginRun(label, settings.maxN, Date.now(), settings.unit);
    const listeners = { onProgress: (p: AnalysisProgress) => actions.reportProgress(id, p), onRows: (rows: readonly LengthRow[]) => actions.addPartialRows(id, rows) };
    try {
      const result = await call(own.signal, listeners, settings);
      actions.completeRun(id, result);
      const used = input();
      lastRun = used === null ? null : { input: used, result };
      // The worker hashed the bytes it read: the check a session asks for comes free with the run.
      if (result.input.sha256 !== null) actions.checkData(result.input.name, result.input.sha256);
    } catch (error) {
      if (own.signal.aborted) actions.cancelRun(id);
      else actions.failRun(id, error);
    } finally {
      if (controller === own) controller = null;
    }
  };

  const refreshPreview = (): void => {
    if (file === null || head === null) return;
    try {
      const model = previewHead(head, file.size, file.name, previewOptionsFor(store.getState().reading));
      actions.showPreview({ kind: 'ready', name: file.name, model });
    } catch (error) {
      actions.showPreview({ kind: 'failed', name: file.name, message: errorMessage(error) });
    }
  };

  const openSession = async (chosen: File): Promise<void> => {
    try {
      const session = readSession(await chosen.text());
      controller?.abort();
      actions.openSession(session);
    } catch (error) {
      actions.sessionFailed(chosen.name, error);
    }
  };

  let digest: AbortController | null = null;
  /** With a session open, hashes the chosen file to tell whether it holds the session's data. */
  const checkAgainstSession = async (chosen: File): Promise<void> => {
    digest?.abort();
    if (store.getState().session?.sha256 == null) return;
    const own = new AbortController();
    digest = own;
    actions.checkData(chosen.name, 'checking');
    try {
      const sha = await fileSha256(chosen, own.signal);
      if (file === chosen) actions.checkData(chosen.name, sha);
    } catch (error) {
      if (!own.signal.aborted && file === chosen) actions.checkData(chosen.name, null, `the file could not be read: ${errorMessage(error)}`);
    }
  };

  const isSessionFile = async (chosen: File): Promise<boolean> => {
    if (!/\.json$/i.test(chosen.name)) return false;
    try {
      return looksLikeSession(await chosen.slice(0, SESSION_HEAD_BYTES).text());
    } catch {
      return false;
    }
  };

  const openFile = async (chosen: File): Promise<void> => {
    // A session file dropped or picked as data opens as a session.
    if (await isSessionFile(chosen)) return openSession(chosen);
    file = chosen;
    void checkAgainstSession(chosen);
    head = null;
    actions.chooseInput({ kind: 'file', name: chosen.name, bytes: chosen.size });
    actions.showPreview(null);
    try {
      const bytes = new Uint8Array(await chosen.slice(0, PREVIEW_BYTES).arrayBuffer());
      if (file !== chosen) return; // another file was opened meanwhile
      head = bytes;
      refreshPreview();
    } catch (error) {
      if (file === chosen) actions.showPreview({ kind: 'failed', name: chosen.name, message: `the file could not be read: ${errorMessage(error)}` });
    }
  };

  const runFile = (f: File): Promise<void> => {
    const { reading } = store.getState();
    let used: CalibrationInput | null = null;
    return execute(
      `“${f.name}”`,
      async (signal, listeners, settings) => {
        const text = reading.format === 'auto' ? await f.slice(0, SNIFF_BYTES).text() : '';
        const options = { ...readerOptionsFor(f.name, text, reading), name: f.name };
        const { name: _name, ...readerOptions } = options;
        used = { kind: 'file', file: f, options: readerOptions };
        return client.analyzeFile(f, options, settings, { signal, ...listeners });
      },
      () => used,
    );
  };

  const chooseDemo = (id: string): void => {
    const { seed } = demoScenario(id);
    file = null;
    head = null;
    actions.chooseInput({ kind: 'demo', id, length: store.getState().demoLength, seed });
  };

  const runDemo = (id: string, length: number, seed: number): Promise<void> => {
    const { title } = demoScenario(id);
    return execute(
      title,
      (signal, listeners, settings) => client.analyzeDemo(id, length, seed, settings, { signal, ...listeners }),
      () => ({ kind: 'demo', id, length, seed }),
    );
  };

  return {
    openFile,
    refreshPreview,
    chooseDemo,
    run: () => {
      const { chosen, demoLength } = store.getState();
      if (chosen?.kind === 'file' && file !== null) return runFile(file);
      if (chosen?.kind === 'demo') {
        // The demo length may have changed since the entry was chosen; the run uses the current one.
        actions.chooseInput({ ...chosen, length: demoLength });
        return runDemo(chosen.id, demoLength, chosen.seed);
      }
      chooseDemo(DEFAULT_DEMO.id);
      return runDemo(DEFAULT_DEMO.id, demoLength, DEFAULT_DEMO.seed);
    },
    cancel: () => controller?.abort(),
    openSession,
    sessionFile: (savedAt = new Date()) => {
      const { result, settings, view, reading, calibration: run, comparisonResult: comparison } = store.getState();
      if (result === null) return null;
      // The calibration goes along only when it belongs to the result saved (a stale one would not read back).
      const calibration = run?.result != null && calibrationBelongsTo(run.result, result) ? run.result : null;
      const text = writeSession(sessionOf({ result, settings, view, reading, savedAt: savedAt.toISOString(), calibration, comparison }));
      return { name: sessionFileName(result.input.name), text };
    },
    calibrationInput: () => (lastRun !== null && lastRun.result === store.getState().result ? lastRun.input : null),
    currentInput: () => {
      const { chosen, demoLength } = store.getState();
      if (chosen?.kind === 'file') return file === null ? null : { kind: 'file', file };
      if (chosen?.kind === 'demo') return { kind: 'demo', id: chosen.id, length: demoLength, seed: chosen.seed };
      return { kind: 'demo', id: DEFAULT_DEMO.id, length: demoLength, seed: DEFAULT_DEMO.seed };
    },
  };
}

/** The page's runner; its worker starts on the first run. */
export const runner = createRunner(createAnalysisClient(), appStore);

/** On first load (nothing saved from an earlier visit) the page opens with the default demo, run. */
export function openDemoIfEmpty(r: Runner = runner, store: StoreHandle = appStore): void {
  const { result, run } = store.getState();
  if (result === null && run.status === 'idle') void r.run();
}
