import type { AnalysisResult } from '../core';
import { autocorrelationFigure } from './autocorrelationFigure';
import { EXPORT_SIZE, type ExportedFigure } from './exportFigures';
import { figureCaption, type FigureCaption } from './figureCaption';
import type { FigureSize } from './figureModel';
import { mixingFigure } from './mixingFigure';

/** The diagnostics views, in the order the workbench shows them; also the file stems. */
export const DIAGNOSTIC_FIGURE_IDS = ['mixing-beta', 'information-acf'] as const;
export type DiagnosticFigureId = (typeof DIAGNOSTIC_FIGURE_IDS)[number];

export type ExportedDiagnosticFigure = ExportedFigure<DiagnosticFigureId>;

/** True for the ids of the diagnostics views (the export toolbar picks their caption with it). */
export function isDiagnosticFigureId(id: string): id is DiagnosticFigureId {
  return (DIAGNOSTIC_FIGURE_IDS as readonly string[]).includes(id);
}

/** The caption of one diagnostics view: the result's source and settings plus m or k. */
export function diagnosticCaption(id: DiagnosticFigureId, result: AnalysisResult): FigureCaption {
  const d = result.diagnostics;
  if (id === 'mixing-beta') return figureCaption(result, d?.beta ? `block length m = ${d.beta.blockLength}` : '');
  return figureCaption(result, d?.autocorrelation ? `k = ${d.autocorrelation.order}` : '');
}

/** The diagnostics figures of a result with their captions (command line files, tests). */
export function exportDiagnosticFigures(result: AnalysisResult, size: FigureSize = EXPORT_SIZE): ExportedDiagnosticFigure[] {
  const d = result.diagnostics;
  return [
    { id: 'mixing-beta', figure: mixingFigure(d, size), caption: diagnosticCaption('mixing-beta', result) },
    { id: 'information-acf', figure: autocorrelationFigure(d, size), caption: diagnosticCaption('information-acf', result) },
  ];
}
