import type { AnalysisResult } from '../core';
import { convergenceFigure } from './convergenceFigure';
import { DEFAULT_ENVELOPE_OPTIONS, type EnvelopeOptions } from './envelopeBands';
import { envelopeFigure } from './envelopeFigure';
import { figureCaption, type FigureCaption } from './figureCaption';
import type { Figure, FigureSize } from './figureModel';
import { fluctuationHistogramFigure, fluctuationQuantileFigure, fluctuationStatistics } from './fluctuationFigure';
import { returnLawFigure, returnLawStatistics } from './returnLawFigure';
import { varianceGrowthFigure } from './varianceGrowthFigure';
import { clampViewLength } from './viewLength';

/** The views a result is exported as, in the order the workbench shows them; also the file stems. */
export const EXPORT_FIGURE_IDS = ['convergence', 'envelopes', 'variance-growth', 'fluctuations-qq', 'fluctuations-histogram', 'return-law'] as const;
export type ExportFigureId = (typeof EXPORT_FIGURE_IDS)[number];

/** Size of an exported figure's plot in pixels (16:9), before title, legend and caption are added. */
export const EXPORT_SIZE: FigureSize = { width: 960, height: 540 };

/** The view options that shape the figures; the workbench's defaults apply where one is left out. */
export interface ExportViewOptions extends EnvelopeOptions {
  readonly showPaths: boolean;
  /** Block length of the fluctuation views; null: the middle of the trusted range (defaultViewLength). */
  readonly fluctuationN: number | null;
  readonly fluctuationGap: number;
  /** Block length of the return-law view; null: as fluctuationN. */
  readonly returnLawN: number | null;
}

/** The workbench's default view options (src/ui/store/viewSlice.ts DEFAULT_VIEW holds the same). */
export const DEFAULT_EXPORT_VIEW: ExportViewOptions = { ...DEFAULT_ENVELOPE_OPTIONS, showPaths: true, fluctuationN: null, fluctuationGap: 1, returnLawN: null };

export interface ExportedFigure {
  readonly id: ExportFigureId;
  readonly figure: Figure;
  readonly caption: FigureCaption;
}

/** Every view of a result as figures with captions: one code path for the command line's files and tests. */
export function exportFigures(result: AnalysisResult, view: ExportViewOptions = DEFAULT_EXPORT_VIEW, size: FigureSize = EXPORT_SIZE): ExportedFigure[] {
  const fn = clampViewLength(result, view.fluctuationN);
  const rn = clampViewLength(result, view.returnLawN);
  const fluctuations = fluctuationStatistics(result, fn, view.fluctuationGap);
  const envelope = `z ${view.z}, δ ${view.delta}, C ${view.errorC}`;
  const at = (n: number, extra = ''): string => `n = ${n}${extra}`;
  return [
    { id: 'convergence', figure: convergenceFigure(result, size, { showPaths: view.showPaths }), caption: figureCaption(result, view.showPaths ? 'sampled paths shown' : 'sampled paths hidden') },
    { id: 'envelopes', figure: envelopeFigure(result, size, view), caption: figureCaption(result, envelope) },
    { id: 'variance-growth', figure: varianceGrowthFigure(result, size), caption: figureCaption(result) },
    { id: 'fluctuations-qq', figure: fluctuationQuantileFigure(fluctuations, size), caption: figureCaption(result, at(fn, `, least gap ${view.fluctuationGap}`)) },
    { id: 'fluctuations-histogram', figure: fluctuationHistogramFigure(fluctuations, size), caption: figureCaption(result, at(fn, `, least gap ${view.fluctuationGap}`)) },
    { id: 'return-law', figure: returnLawFigure(returnLawStatistics(result, rn), size), caption: figureCaption(result, at(rn)) },
  ];
}
