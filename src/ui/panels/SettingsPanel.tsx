import { useState } from 'react';
import type { EntropyUnit } from '../../core';
import { resetSettings, updateSettings, useAppState } from '../store/store';
import { CONFIDENCE_CHOICES, MAX_N_RANGE, parseMaxN } from '../view/settingsView';

/** The analysis settings the page exposes; they apply to the next run. */
export function SettingsPanel() {
  const settings = useAppState((s) => s.settings);
  const [maxNText, setMaxNText] = useState<string | null>(null);
  const shownMaxN = maxNText ?? String(settings.maxN);
  return (
    <section className="panel" aria-labelledby="settings-heading">
      <h2 id="settings-heading">Settings</h2>
      <div className="field-row">
        <label className="field">
          <span>Unit</span>
          <select value={settings.unit} onChange={(event) => updateSettings({ unit: event.currentTarget.value as EntropyUnit })}>
            <option value="nat">nats</option>
            <option value="bit">bits</option>
          </select>
        </label>
        <label className="field">
          <span>Largest n</span>
          <input
            type="number"
            inputMode="numeric"
            min={MAX_N_RANGE[0]}
            max={MAX_N_RANGE[1]}
            value={shownMaxN}
            aria-invalid={parseMaxN(shownMaxN) === null}
            onChange={(event) => {
              const text = event.currentTarget.value;
              const maxN = parseMaxN(text);
              setMaxNText(maxN === null ? text : null);
              if (maxN !== null) updateSettings({ maxN });
            }}
          />
        </label>
        <label className="field">
          <span>Confidence</span>
          <select value={String(settings.confidence)} onChange={(event) => updateSettings({ confidence: Number(event.currentTarget.value) })}>
            {CONFIDENCE_CHOICES.map((c) => (
              <option key={c.value} value={String(c.value)}>
                {c.label}
              </option>
            ))}
          </select>
        </label>
      </div>
      <div className="button-row">
        <button
          type="button"
          className="quiet"
          onClick={() => {
            setMaxNText(null);
            resetSettings();
          }}
        >
          Reset to defaults
        </button>
        <span className="hint">Settings apply to the next run.</span>
      </div>
    </section>
  );
}
