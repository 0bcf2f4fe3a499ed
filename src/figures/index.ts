// Pure figure models for hosts (the workbench draws them; the command line can write them as SVG).
export type * from './figureModel';
export { PALETTE, SERIES_COLOURS, BAND_OPACITY } from './palette';
export type { PaletteName } from './palette';
export { STYLES } from './seriesStyle';
export { readoutNumber, readoutPercent } from './readoutFormat';
export { MARGIN, MIN_SIZE, plotArea } from './plotArea';
export { CANVAS_SEGMENT_LIMIT } from './pathLayer';
export { convergenceFigure } from './convergenceFigure';
export type { ConvergenceOptions } from './convergenceFigure';
export { envelopeFigure, envelopeStatistics } from './envelopeFigure';
export type { EnvelopeStatistics } from './envelopeFigure';
export { DEFAULT_ENVELOPE_OPTIONS, envelopeOptionProblems, errorTermHalfWidth, gaussianHalfWidth, iteratedLogHalfWidth } from './envelopeBands';
export type { EnvelopeField, EnvelopeOptions } from './envelopeBands';
export type { BandWidths, EnvelopeBand, ExceedanceRow } from './envelopeExceedance';
export { varianceGrowthFigure, fittedVarianceLine } from './varianceGrowthFigure';
export type { FittedLine } from './varianceGrowthFigure';
export { markerPath } from './markerPath';
export { nearestStop, stepStop } from './nearestStop';
