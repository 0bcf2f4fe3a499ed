import type { AnalysisResult } from '../core';
import { autocorrelationFigure } from './autocorrelationFigure';
import { EXPORT_SIZE } from './exportFigures';
import { figureCaption, type FigureCaption } from './figureCaption';
import type { Figure, FigureSize } from './figureModel';
import { mixingFigure } from './mixingFigure';

/** The diagnostics views, in the order the workbench shows them; also the file stems. */
export const DIAGNOSTIC_FIGURE_IDS = ['mixing-beta', 'information-acf'] as const;
export type DiagnosticFigureId = (typeof DIAGNOSTIC_FIGURE_IDS)[number];

export interface ExportedDiagnosticFigure {
  readonly id: DiagnosticFigureId;
  readonly figure: Figure;
  readonly caption: FigureCaption;
}

/** The diagnostics figures of a result with their captions (command line files, report, tests). */
export function exportDiagnosticFigures(result: AnalysisResult, size: FigureSize = EXPORT_SIZE): ExportedDiagnosticFigure[] {
  const d = result.diagnostics;
  const m = d?.beta?.blockLength;
  return [
    { id: 'mixing-beta', figure: mixingFigure(d, size), caption: figureCaption(result, m === undefined ? '' : `block length m = ${m}`) },
    { id: 'information-acf', figure: autocorrelationFigure(d, size), caption: figureCaption(result, d?.autocorrelation ? `k = ${d.autocorrelation.order}` : '') },
  ];
}
