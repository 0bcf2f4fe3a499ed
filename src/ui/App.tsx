import { useEffect } from 'react';
import { CalibrationPanel } from './panels/CalibrationPanel';
import { ComparePanel } from './panels/ComparePanel';
import { ConvergencePanel } from './panels/ConvergencePanel';
import { DiagnosticsPanel } from './panels/DiagnosticsPanel';
import { EnvelopePanel } from './panels/EnvelopePanel';
import { ErrorBoundary } from './panels/ErrorBoundary';
import { FailureAlert } from './panels/FailureAlert';
import { FluctuationPanel } from './panels/FluctuationPanel';
import { GalleryPanel } from './panels/GalleryPanel';
import { InputPanel } from './panels/InputPanel';
import { LengthTablePanel } from './panels/LengthTablePanel';
import { PreviewPanel } from './panels/PreviewPanel';
import { ReturnLawPanel } from './panels/ReturnLawPanel';
import { RunPanel } from './panels/RunPanel';
import { SessionPanel } from './panels/SessionPanel';
import { SettingsPanel } from './panels/SettingsPanel';
import { SummaryPanel } from './panels/SummaryPanel';
import { VarianceGrowthPanel } from './panels/VarianceGrowthPanel';
import { openDemoIfEmpty } from './runner';
import { whenHydrated } from './store/store';

/** The workbench shell: header, controls on the left, results on the right. */
export function App() {
  // The saved state arrives asynchronously from IndexedDB; only then is it known whether the page is empty.
  useEffect(() => whenHydrated(() => openDemoIfEmpty()), []);
  return (
    <div className="app">
      <header className="app-header">
        <h1>returnrate</h1>
        <p>Entropy rate of a symbol sequence from the return times of its blocks, with error bars.</p>
      </header>
      <ErrorBoundary name="The error message">
        <FailureAlert />
      </ErrorBoundary>
      <main className="layout">
        <div className="column">
          <ErrorBoundary name="Input">
            <InputPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Run">
            <RunPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Session">
            <SessionPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Settings">
            <SettingsPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Demo gallery">
            <GalleryPanel />
          </ErrorBoundary>
        </div>
        <div className="column wide">
          <ErrorBoundary name="Preview">
            <PreviewPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Estimate">
            <SummaryPanel />
          </ErrorBoundary>
          <ErrorBoundary name="Per-n table">
            <LengthTablePanel />
          </ErrorBoundary>
        </div>
      </main>
      <div className="figures">
        <ErrorBoundary name="Convergence figure">
          <ConvergencePanel />
        </ErrorBoundary>
        <ErrorBoundary name="Envelope figure">
          <EnvelopePanel />
        </ErrorBoundary>
        <ErrorBoundary name="Variance growth figure">
          <VarianceGrowthPanel />
        </ErrorBoundary>
        <ErrorBoundary name="Fluctuation figures">
          <FluctuationPanel />
        </ErrorBoundary>
        <ErrorBoundary name="Return law figure">
          <ReturnLawPanel />
        </ErrorBoundary>
        <ErrorBoundary name="Mixing diagnostics">
          <DiagnosticsPanel />
        </ErrorBoundary>
        <ErrorBoundary name="Calibration">
          <CalibrationPanel />
        </ErrorBoundary>
        <ErrorBoundary name="Compare two sequences">
          <ComparePanel />
        </ErrorBoundary>
      </div>
      <footer className="app-footer">
        Demo data are invented. Estimates are research estimates, not a diagnosis; everything runs in this browser tab and no data leave it.
      </footer>
    </div>
  );
}
