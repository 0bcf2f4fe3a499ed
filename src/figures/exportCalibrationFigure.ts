import { calibrationBelongsTo, PROGRAM_VERSION } from '../core';
import type { AnalysisResult, CalibrationResult } from '../core';
import { calibrationFigure } from './calibrationFigure';
import { EXPORT_SIZE, type ExportedFigure } from './exportFigures';
import { figureCaption, type FigureCaption } from './figureCaption';
import type { FigureSize } from './figureModel';

/** File stem and CSV name of the calibration figure. */
export const CALIBRATION_FIGURE_ID = 'calibration';
export type CalibrationFigureId = typeof CALIBRATION_FIGURE_ID;

export type ExportedCalibrationFigure = ExportedFigure<CalibrationFigureId>;

/** The calibration's own words for the caption's view line: replicates, seed, fitted order. */
export function calibrationViewText(cal: CalibrationResult): string {
  const partial = cal.partial ? ' (partial)' : '';
  return (
    `calibration by Markov surrogates: ${cal.summary.replicates} of ${cal.replicatesRequested} replicates${partial}, ` +
    `base seed ${cal.baseSeed}, fitted order ${cal.model.order} (${cal.model.criterion})`
  );
}

/**
 * The caption of the calibration figure: input name, SHA-256 and settings of the calibrated
 * analysis, and the replicates and seed. With the result it belongs to, the caption is that
 * result's (symbolization and program included); without it, the calibration's own record.
 */
export function calibrationCaption(cal: CalibrationResult, result: AnalysisResult | null = null): FigureCaption {
  const view = calibrationViewText(cal);
  if (result !== null && calibrationBelongsTo(cal, result)) return figureCaption(result, view);
  return figureCaption({ input: cal.input, settings: cal.settings, program: { name: 'returnrate', version: PROGRAM_VERSION } }, view);
}

/** The calibration figure of h with its caption (command line files, report, tests). */
export function exportCalibrationFigure(cal: CalibrationResult, result: AnalysisResult | null = null, size: FigureSize = EXPORT_SIZE): ExportedCalibrationFigure {
  return { id: CALIBRATION_FIGURE_ID, figure: calibrationFigure(cal, size, 'entropy'), caption: calibrationCaption(cal, result) };
}
