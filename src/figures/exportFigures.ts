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

/** One exported view: its id (also the file stem), the figure and its caption. The comparison,
 * diagnostics and calibration exports use it with their own ids. */
export interface ExportedFigure<Id extends string = ExportFigureId> {
  readonly id: Id;
  readonly figure: Figure;
  readonly caption: FigureCaption;
}

/** The caption of one exported view: the result's source and settings plus the view options that shape it. */
export function exportCaption(id: ExportFigureId, result: AnalysisResult, view: ExportViewOptions = DEFAULT_EXPORT_VIEW): FigureCaption {
  const gap = `, least gap ${view.fluctuationGap}`;
  switch (id) {
    case 'convergence':
      return figureCaption(result, view.showPaths ? 'sampled paths shown' : 'sampled paths hidden');
    case 'envelopes':
      return figureCaption(result, `z ${view.z}, δ ${view.delta}, C ${view.errorC}`);
    case 'variance-growth':
      return figureCaption(result);
    case 'fluctuations-qq':
    case 'fluctuations-histogram':
      return figureCaption(result, `n = ${clampViewLength(result, view.fluctuationN)}${gap}`);
    case 'return-law':
      return figureCaption(result, `n = ${clampViewLength(result, view.returnLawN)}`);
  }
}

/** Every view of a result as figures with captions: one code path for the command line's files and tests. */
export function exportFigures(result: AnalysisResult, view: ExportViewOptions = DEFAULT_EXPORT_VIEW, size: FigureSize = EXPORT_SIZE): ExportedFigure[] {
  const fluctuations = fluctuationStatistics(result, clampViewLength(result, view.fluctuationN), view.fluctuationGap);
  const figures: Record<ExportFigureId, Figure> = {
    convergence: convergenceFigure(result, size, { showPaths: view.showPaths }),
    envelopes: envelopeFigure(result, size, view),
    'variance-growth': varianceGrowthFigure(result, size),
    'fluctuations-qq': fluctuationQuantileFigure(fluctuations, size),
    'fluctuations-histogram': fluctuationHistogramFigure(fluctuations, size),
    'return-law': returnLawFigure(returnLawStatistics(result, clampViewLength(result, view.returnLawN)), size),
  };
  return EXPORT_FIGURE_IDS.map((id) => ({ id, figure: figures[id], caption: exportCaption(id, result, view) }));
}
