import type { AnalysisResult, AnalysisSettings } from '../result/analysisResult';

const SETTING_KEYS: readonly (keyof AnalysisSettings)[] = ['maxN', 'unit', 'intervalSeconds', 'maxCensoredFraction', 'confidence'];

/** What ties a calibration to the analysis it calibrates (a CalibrationResult and a CalibrationRun's analysis both have it). */
export interface CalibrationTie {
  readonly input: { readonly name: string; readonly sha256: string | null; readonly symbols: number };
  readonly settings: AnalysisSettings;
}

/**
 * The first field where a calibration and a result disagree ('input.sha256', 'settings.maxN', ...),
 * or null when the calibration belongs to the result: same input name, SHA-256, length and
 * settings. Settings are compared field by field, so the order their keys were written in does not matter.
 */
export function calibrationMismatch(calibration: CalibrationTie, result: Pick<AnalysisResult, 'input' | 'settings'>): string | null {
  for (const key of ['name', 'sha256', 'symbols'] as const) if (calibration.input[key] !== result.input[key]) return `input.${key}`;
  for (const key of SETTING_KEYS) if (calibration.settings[key] !== result.settings[key]) return `settings.${key}`;
  return null;
}

/** True when the calibration belongs to the result (calibrationMismatch finds nothing). */
export function calibrationBelongsTo(calibration: CalibrationTie, result: Pick<AnalysisResult, 'input' | 'settings'>): boolean {
  return calibrationMismatch(calibration, result) === null;
}
