import { SNIFF_BYTES } from '../core';
import type { AnalysisResult, AnalysisSettings } from '../core';
import type { AnalysisClient, AnalysisProgress } from './analysisClient';
import { createAnalysisClient } from './analysisClient';
import { DEFAULT_DEMO } from './store/inputSlice';
import { readerOptionsFor } from './view/inputOptions';
import { appStore, bindActions } from './store/store';
import type { StoreHandle } from './store/store';

/** Starts and stops analyses; the only code that talks to the analysis client. */
export interface Runner {
  /** Reads and analyses a file with the current format choice and settings. */
  runFile(file: File): Promise<void>;
  /** Generates and analyses the demo with the current demo length. */
  runDemo(): Promise<void>;
  /** Runs the last chosen input again (the demo when none was chosen) with the current settings. */
  rerun(): Promise<void>;
  /** Stops the running analysis, if any. */
  cancel(): void;
}

type Call = (signal: AbortSignal, onProgress: (p: AnalysisProgress) => void, settings: AnalysisSettings) => Promise<AnalysisResult>;

export function createRunner(client: AnalysisClient, store: StoreHandle): Runner {
  const actions = bindActions(store);
  let controller: AbortController | null = null;
  let lastFile: File | null = null;

  const execute = async (label: string, call: Call): Promise<void> => {
    controller?.abort();
    const own = new AbortController();
    controller = own;
    const { settings } = store.getState();
    const id = actions.beginRun(label, settings.maxN);
    try {
      const result = await call(own.signal, (p) => actions.reportProgress(id, p), settings);
      actions.completeRun(id, result);
    } catch (error) {
      if (own.signal.aborted) actions.cancelRun(id);
      else actions.failRun(id, error);
    } finally {
      if (controller === own) controller = null;
    }
  };

  const runFile = (file: File): Promise<void> => {
    lastFile = file;
    actions.chooseInput({ kind: 'file', name: file.name, bytes: file.size });
    const { format, csvColumn } = store.getState();
    return execute(`“${file.name}”`, async (signal, onProgress, settings) => {
      const head = format === 'auto' ? await file.slice(0, SNIFF_BYTES).text() : '';
      const options = { ...readerOptionsFor(file.name, head, format, csvColumn), name: file.name };
      return client.analyzeFile(file, options, settings, { signal, onProgress });
    });
  };

  const runDemo = (): Promise<void> => {
    const length = store.getState().demoLength;
    const { id, seed } = DEFAULT_DEMO;
    lastFile = null;
    actions.chooseInput({ kind: 'demo', id, length, seed });
    return execute('the invented demo', (signal, onProgress, settings) => client.analyzeDemo(id, length, seed, settings, { signal, onProgress }));
  };

  return {
    runFile,
    runDemo,
    rerun: () => (lastFile !== null && store.getState().chosen?.kind === 'file' ? runFile(lastFile) : runDemo()),
    cancel: () => controller?.abort(),
  };
}

/** The page's runner; its worker starts on the first run. */
export const runner = createRunner(createAnalysisClient(), appStore);

/** On first load (nothing saved from an earlier visit) the page opens with the demo. */
export function openDemoIfEmpty(r: Runner = runner, store: StoreHandle = appStore): void {
  const { result, run } = store.getState();
  if (result === null && run.status === 'idle') void r.runDemo();
}
