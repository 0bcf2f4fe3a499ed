import type { LegendEntry, LegendKind, SeriesStyle } from './figureModel';
import type { PaletteName } from './palette';

/**
 * The fixed look of each kind of series, shared by all figures so one thing looks the same
 * everywhere. Each differs from the others by dash or marker as well as by colour.
 */
export const STYLES = {
  samplePath: { colour: 'pathGrey', dash: '', width: 0.8, marker: null },
  mean: { colour: 'cobalt', dash: '', width: 2.2, marker: 'circle' },
  pluginRate: { colour: 'amber', dash: '7 3', width: 2, marker: 'square' },
  conditional: { colour: 'teal', dash: '2 3', width: 2, marker: 'triangle' },
  exact: { colour: 'ink', dash: '10 4 2 4', width: 1.6, marker: null },
  estimate: { colour: 'lilac', dash: '5 5', width: 1.8, marker: null },
  zero: { colour: 'ink', dash: '', width: 1, marker: null },
  gaussianBand: { colour: 'cobalt', dash: '', width: 1.4, marker: null },
  lilEnvelope: { colour: 'amber', dash: '7 3', width: 2, marker: null },
  errorTerm: { colour: 'teal', dash: '2 3', width: 2, marker: null },
  variancePoints: { colour: 'cobalt', dash: '', width: 1.5, marker: 'circle' },
  fittedLine: { colour: 'amber', dash: '', width: 2.2, marker: null },
  fittedExtension: { colour: 'amber', dash: '3 4', width: 1.4, marker: null },
  headlineSlope: { colour: 'lilac', dash: '5 5', width: 1.8, marker: null },
} as const satisfies Record<string, SeriesStyle>;

export function legendEntry(id: string, label: string, kind: LegendKind, style: SeriesStyle | null, colour?: PaletteName): LegendEntry {
  return { id, label, kind, style, colour: colour ?? style?.colour ?? 'ink' };
}
