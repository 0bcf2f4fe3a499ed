/**
 * A saved workbench session: the last analysis with the settings, reading choices and view options
 * it was shown with. Opening one shows every view again without recomputing; the input's SHA-256
 * inside the result tells whether a file dropped later is the same data.
 */
import type { AnalysisResult, AnalysisSettings } from '../result/analysisResult';
import { PROGRAM_VERSION } from '../result/version';
import type { CalibrationResult } from '../calibration/calibrationResult';
import type { ComparisonResult } from '../cross/comparisonResult';

export const SESSION_SCHEMA = 'returnrate.session/1';

/** A JSON value as JSON.parse gives it. */
export type JsonValue = string | number | boolean | null | readonly JsonValue[] | JsonObject;
export interface JsonObject {
  readonly [key: string]: JsonValue;
}

export interface Session {
  readonly schema: typeof SESSION_SCHEMA;
  /** The program that saved the session (the result carries the one that computed it). */
  readonly program: { readonly name: 'returnrate'; readonly version: string };
  /** When the session was saved, ISO 8601 in UTC. */
  readonly savedAt: string;
  /** The settings shown when saving (they may differ from result.settings if changed after the run). */
  readonly settings: AnalysisSettings;
  /** How the page reads files; the host restores it with its own checks (core does not know its fields). */
  readonly reading: JsonObject;
  /** How the figures are drawn; the host restores it with its own checks. */
  readonly view: JsonObject;
  readonly result: AnalysisResult;
  /** The calibration of `result` (same input name, SHA-256, length and settings; calibrationBelongsTo), when one was shown. Optional: older sessions have none. */
  readonly calibration?: CalibrationResult;
  /** The last two-sequence comparison, when one was shown. Optional: older sessions have none. */
  readonly comparison?: ComparisonResult;
}

export interface SessionParts {
  readonly result: AnalysisResult;
  readonly settings: AnalysisSettings;
  /** Plain data of primitives (the host's view options). */
  readonly view: object;
  /** Plain data of primitives (the host's reading choices). */
  readonly reading: object;
  /** ISO 8601 time of saving; the host passes its clock so core stays free of it. */
  readonly savedAt: string;
  /** The calibration of `result`; left out when absent or null. */
  readonly calibration?: CalibrationResult | null | undefined;
  /** The last comparison; left out when absent or null. */
  readonly comparison?: ComparisonResult | null | undefined;
}

/** The session of these parts, as plain data ready for writeSession. */
export function sessionOf(parts: SessionParts): Session {
  return {
    schema: SESSION_SCHEMA,
    program: { name: 'returnrate', version: PROGRAM_VERSION },
    savedAt: parts.savedAt,
    settings: parts.settings,
    reading: parts.reading as JsonObject,
    view: parts.view as JsonObject,
    result: parts.result,
    ...(parts.calibration == null ? {} : { calibration: parts.calibration }),
    ...(parts.comparison == null ? {} : { comparison: parts.comparison }),
  };
}
