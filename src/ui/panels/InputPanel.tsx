import { useState } from 'react';
import type { DragEvent } from 'react';
import { runner } from '../runner';
import { DEMO_LENGTH_RANGE } from '../store/inputSlice';
import type { FormatChoice } from '../store/inputSlice';
import { setCsvColumn, setDemoLength, setFormat, useAppState } from '../store/store';
import { chosenInputText, FORMAT_CHOICES, parseDemoLength } from '../view/inputOptions';

function runFirst(files: FileList | null): void {
  const file = files?.[0];
  if (file !== undefined) void runner.runFile(file);
}

/** Where the sequence comes from: a dropped or chosen file, or the invented demo. */
export function InputPanel() {
  const format = useAppState((s) => s.format);
  const csvColumn = useAppState((s) => s.csvColumn);
  const demoLength = useAppState((s) => s.demoLength);
  const chosen = useAppState((s) => s.chosen);
  const [dragging, setDragging] = useState(false);
  const [lengthText, setLengthText] = useState(String(demoLength));
  const lengthValid = parseDemoLength(lengthText) !== null;

  const onDragOver = (event: DragEvent): void => {
    event.preventDefault();
    setDragging(true);
  };
  const onDrop = (event: DragEvent): void => {
    event.preventDefault();
    setDragging(false);
    runFirst(event.dataTransfer.files);
  };

  return (
    <section className="panel" aria-labelledby="input-heading">
      <h2 id="input-heading">Input</h2>
      <div className={dragging ? 'drop-zone is-dragging' : 'drop-zone'} onDragOver={onDragOver} onDragLeave={() => setDragging(false)} onDrop={onDrop}>
        <p>Drop a sequence file here</p>
        <label className="file-button">
          Choose a file…
          <input
            type="file"
            className="visually-hidden"
            aria-label="Choose a sequence file"
            onChange={(event) => {
              runFirst(event.currentTarget.files);
              event.currentTarget.value = '';
            }}
          />
        </label>
      </div>
      <div className="field-row">
        <label className="field">
          <span>Format</span>
          <select value={format} onChange={(event) => setFormat(event.currentTarget.value as FormatChoice)}>
            {FORMAT_CHOICES.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
        <label className="field">
          <span>CSV column</span>
          <input
            type="text"
            value={csvColumn}
            placeholder="name or index"
            aria-describedby="csv-column-hint"
            onChange={(event) => setCsvColumn(event.currentTarget.value)}
          />
        </label>
      </div>
      <p id="csv-column-hint" className="hint">
        CSV column: a header name, or a 0-based index. Format and column apply to the next file you choose.
      </p>
      <fieldset className="demo">
        <legend>Demo with invented data</legend>
        <p className="hint">Hill-top station wind sectors: eight compass sectors from a Markov chain of our own design, not measurements.</p>
        <div className="field-row">
          <label className="field">
            <span>Symbols</span>
            <input
              type="number"
              inputMode="numeric"
              min={DEMO_LENGTH_RANGE[0]}
              max={DEMO_LENGTH_RANGE[1]}
              step={1000}
              value={lengthText}
              aria-invalid={!lengthValid}
              onChange={(event) => {
                const text = event.currentTarget.value;
                setLengthText(text);
                const length = parseDemoLength(text);
                if (length !== null) setDemoLength(length);
              }}
            />
          </label>
          <button type="button" onClick={() => void runner.runDemo()} disabled={!lengthValid}>
            Run demo
          </button>
        </div>
      </fieldset>
      <p className="current-input">
        <span className="muted">Current input: </span>
        {chosenInputText(chosen)}
      </p>
    </section>
  );
}
