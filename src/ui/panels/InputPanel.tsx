import { useEffect, useState } from 'react';
import type { DragEvent } from 'react';
import { runner } from '../runner';
import type { MissingPolicy } from '../../core';
import { SYMBOLIZE_DEFAULT_PARAMETER } from '../store/inputSlice';
import type { AmbiguityChoice, FormatChoice, ReadingChoices, SymbolizeKind } from '../store/inputSlice';
import { updateReading, useAppState } from '../store/store';
import { AMBIGUITY_CHOICES, FORMAT_CHOICES, MISSING_CHOICES, SYMBOLIZE_CHOICES } from '../view/inputOptions';

function openFirst(files: FileList | null | undefined): void {
  const file = files?.[0];
  if (file !== undefined) void runner.openFile(file);
}

function changeReading(patch: Partial<ReadingChoices>): void {
  updateReading(patch);
  runner.refreshPreview();
}

function hasFiles(event: { dataTransfer: DataTransfer | null }): boolean {
  return event.dataTransfer?.types.includes('Files') ?? false;
}

/**
 * Files dropped anywhere on the page open like the picker's; without this the browser would
 * navigate away to show the file. Returns whether a file is being dragged over the page.
 */
function usePageDrop(): boolean {
  const [dragging, setDragging] = useState(false);
  useEffect(() => {
    const over = (event: globalThis.DragEvent): void => {
      if (!hasFiles(event)) return;
      event.preventDefault();
      setDragging(true);
    };
    const leave = (event: globalThis.DragEvent): void => {
      // relatedTarget is null only when the pointer leaves the window.
      if (event.relatedTarget === null) setDragging(false);
    };
    const drop = (event: globalThis.DragEvent): void => {
      if (!hasFiles(event)) return;
      event.preventDefault();
      setDragging(false);
      openFirst(event.dataTransfer?.files);
    };
    window.addEventListener('dragover', over);
    window.addEventListener('dragleave', leave);
    window.addEventListener('drop', drop);
    return () => {
      window.removeEventListener('dragover', over);
      window.removeEventListener('dragleave', leave);
      window.removeEventListener('drop', drop);
    };
  }, []);
  return dragging;
}

/** Where a file comes from (dropped anywhere on the page, or picked) and how it is read. */
export function InputPanel() {
  const reading = useAppState((s) => s.reading);
  const preview = useAppState((s) => s.preview);
  const dragging = usePageDrop();
  // Options of the format in use: the chosen one, or the guess the preview made.
  const shown = reading.format !== 'auto' ? reading.format : preview?.kind === 'ready' ? preview.model.format : 'auto';
  const onZoneDragOver = (event: DragEvent): void => event.preventDefault();

  return (
    <section className="panel" aria-labelledby="input-heading">
      <h2 id="input-heading">Input</h2>
      <div className={dragging ? 'drop-zone is-dragging' : 'drop-zone'} onDragOver={onZoneDragOver} data-testid="drop-zone">
        <p>{dragging ? 'Drop the file to preview it' : 'Drop a sequence file anywhere on the page'}</p>
        <label className="file-button">
          Choose a file…
          <input
            type="file"
            className="visually-hidden"
            aria-label="Choose a sequence file"
            onChange={(event) => {
              openFirst(event.currentTarget.files);
              event.currentTarget.value = '';
            }}
          />
        </label>
        <p className="hint">The file is previewed first; press Run to analyse it.</p>
      </div>
      <div className="field-row">
        <label className="field">
          <span>Format</span>
          <select value={reading.format} onChange={(event) => changeReading({ format: event.currentTarget.value as FormatChoice })}>
            {FORMAT_CHOICES.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
        {(shown === 'csv' || shown === 'auto') && (
          <label className="field">
            <span>CSV column</span>
            <input
              type="text"
              value={reading.csvColumn}
              placeholder="name or index"
              aria-describedby="csv-column-hint"
              onChange={(event) => changeReading({ csvColumn: event.currentTarget.value })}
            />
          </label>
        )}
      </div>
      {(shown === 'csv' || shown === 'auto') && (
        <p id="csv-column-hint" className="hint">
          CSV column: a header name, or a 0-based index.
        </p>
      )}
      {/* Under 'auto' a file of numbers looks like tokens until a symbolization is chosen, so the choice is always offered there. */}
      {(reading.format === 'auto' || shown === 'csv' || shown === 'numbers') && <SymbolizeFields reading={reading} />}
      <div className="check-row">
        {shown === 'csv' && (
          <label className="check">
            <input type="checkbox" checked={reading.csvHeader} onChange={(event) => changeReading({ csvHeader: event.currentTarget.checked })} />
            First row is a header
          </label>
        )}
        {shown === 'chars' && (
          <label className="check">
            <input
              type="checkbox"
              checked={reading.keepWhitespace}
              onChange={(event) => changeReading({ keepWhitespace: event.currentTarget.checked })}
            />
            Keep spaces and tabs as symbols
          </label>
        )}
        {shown === 'fasta' && (
          <>
            <label className="field">
              <span>Ambiguity codes and gaps</span>
              <select value={reading.ambiguity} onChange={(event) => changeReading({ ambiguity: event.currentTarget.value as AmbiguityChoice })}>
                {AMBIGUITY_CHOICES.map((c) => (
                  <option key={c.value} value={c.value}>
                    {c.label}
                  </option>
                ))}
              </select>
            </label>
            <label className="check">
              <input type="checkbox" checked={reading.caseFold} onChange={(event) => changeReading({ caseFold: event.currentTarget.checked })} />
              Read lower case as upper case
            </label>
          </>
        )}
      </div>
    </section>
  );
}

/** How real numbers become symbols, and what happens to missing values (numbers and CSV input). */
function SymbolizeFields({ reading }: { readonly reading: ReadingChoices }) {
  const choice = SYMBOLIZE_CHOICES.find((c) => c.value === reading.symbolizeKind);
  return (
    <div className="field-row">
      <label className="field">
        <span>Symbolize numbers</span>
        <select
          value={reading.symbolizeKind}
          onChange={(event) => {
            const kind = event.currentTarget.value as SymbolizeKind;
            changeReading({ symbolizeKind: kind, symbolizeParameter: SYMBOLIZE_DEFAULT_PARAMETER[kind] });
          }}
        >
          {SYMBOLIZE_CHOICES.map((c) => (
            <option key={c.value} value={c.value}>
              {c.label}
            </option>
          ))}
        </select>
      </label>
      {reading.symbolizeKind !== 'none' && (
        <>
          <label className="field">
            <span>{choice?.parameter ?? 'Parameter'}</span>
            <input type="text" value={reading.symbolizeParameter} onChange={(event) => changeReading({ symbolizeParameter: event.currentTarget.value })} />
          </label>
          <label className="field">
            <span>Missing values</span>
            <select value={reading.missing} onChange={(event) => changeReading({ missing: event.currentTarget.value as MissingPolicy })}>
              {MISSING_CHOICES.map((c) => (
                <option key={c.value} value={c.value}>
                  {c.label}
                </option>
              ))}
            </select>
          </label>
        </>
      )}
    </div>
  );
}
