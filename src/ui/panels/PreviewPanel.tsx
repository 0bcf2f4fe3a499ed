import { useMemo } from 'react';
import type { SymbolizationSummary } from '../../core';
import { useAppState } from '../store/store';
import { previewView } from '../view/previewView';
import type { PreviewView } from '../view/previewView';
import { SymbolizationPreview } from './SymbolizationPreview';
import { SymbolCountTable } from './SymbolCountTable';
import { cautionColumns, physiologicalCaution } from '../view/cautionView';

function Ready({ view, symbolization }: { readonly view: Extract<PreviewView, { kind: 'ready' }>; readonly symbolization: SymbolizationSummary | undefined }) {
  return (
    <>
      <p className="preview-format" data-testid="preview-format">
        {view.formatLine}
      </p>
      {view.warnings.length > 0 && (
        <ul className="preview-warnings" aria-label="Problems found in the preview">
          {view.warnings.map((w) => (
            <li key={w}>{w}</li>
          ))}
        </ul>
      )}
      <div className="preview-grid">
        <figure className="preview-lines">
          <figcaption>{view.linesCaption}</figcaption>
          {/* Printed as text (React escapes it); control characters were made visible by the view. */}
          <pre tabIndex={0} aria-label={view.linesCaption} data-testid="preview-lines">
            {view.lines.join('\n')}
          </pre>
        </figure>
        <div className="preview-alphabet">
          <p data-testid="preview-symbols">{view.symbolsLine}</p>
          {view.alphabet.length > 0 && (
            <SymbolCountTable rows={view.alphabet} caption={view.alphabetCaption} regionLabel="Alphabet of the preview, scrollable" />
          )}
        </div>
      </div>
      {symbolization !== undefined && <SymbolizationPreview summary={symbolization} scope={view.scope} />}
    </>
  );
}

/** The chosen file's head as the reader sees it, before the run; hidden when no file is open. */
export function PreviewPanel() {
  const preview = useAppState((s) => s.preview);
  const view = useMemo(() => (preview === null ? null : previewView(preview)), [preview]);
  const csvColumn = useAppState((s) => s.reading.csvColumn);
  if (view === null || preview === null) return null;
  const format = preview.kind === 'ready' ? preview.model.format : '';
  const header = preview.kind === 'ready' && preview.model.linesKind === 'text' ? (preview.model.lines[0] ?? null) : null;
  const caution = physiologicalCaution({ name: preview.name, format }, cautionColumns(format, csvColumn, header));
  return (
    <section className="panel preview" aria-labelledby="preview-heading" data-testid="preview">
      <h2 id="preview-heading">{view.title}</h2>
      {caution !== null && (
        <p className="caution-note" role="note" data-testid="preview-physiological-caution">
          {caution}
        </p>
      )}
      {view.kind === 'failed' ? (
        <p className="alert-message" role="alert">
          {view.message}
        </p>
      ) : (
        <Ready view={view} symbolization={preview?.kind === 'ready' ? preview.model.symbolization : undefined} />
      )}
    </section>
  );
}
