import { DEFAULT_SETTINGS } from '../../core';
import type { AnalysisSettings } from '../../core';
import type { StoreHandle } from './store';

export interface SettingsState {
  readonly settings: AnalysisSettings;
}

export const initialSettingsState: SettingsState = { settings: DEFAULT_SETTINGS };

/**
 * Stored settings merged over the defaults, so settings saved by an older page (missing or
 * mistyped fields) still give a complete object; the core validates values when a run starts.
 */
export function restoreSettings(stored: unknown): AnalysisSettings {
  if (typeof stored !== 'object' || stored === null) return DEFAULT_SETTINGS;
  const s = stored as Record<string, unknown>;
  const pick = <K extends keyof AnalysisSettings>(key: K, ok: (v: unknown) => boolean): AnalysisSettings[K] =>
    ok(s[key]) ? (s[key] as AnalysisSettings[K]) : DEFAULT_SETTINGS[key];
  const isNumber = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v);
  return {
    maxN: pick('maxN', isNumber),
    unit: pick('unit', (v) => v === 'nat' || v === 'bit'),
    intervalSeconds: pick('intervalSeconds', (v) => v === null || isNumber(v)),
    maxCensoredFraction: pick('maxCensoredFraction', isNumber),
    confidence: pick('confidence', isNumber),
  };
}

export function settingsActions(store: StoreHandle) {
  return {
    /** Replaces the settings with a new snapshot carrying the patch. */
    updateSettings(patch: Partial<AnalysisSettings>): void {
      store.setState((s) => ({ settings: { ...s.settings, ...patch } }));
    },
    resetSettings(): void {
      store.setState({ settings: DEFAULT_SETTINGS });
    },
  };
}
