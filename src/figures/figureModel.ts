import type { PaletteName } from './palette';

/** Pixel size of a whole figure (axes and labels included). */
export interface FigureSize {
  readonly width: number;
  readonly height: number;
}

/** The plotting rectangle inside the figure, in pixels from the figure's top left corner. */
export interface PlotArea {
  readonly left: number;
  readonly top: number;
  readonly width: number;
  readonly height: number;
}

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond';

/** How a series is drawn: colour plus a second cue (dash pattern or marker) that needs no colour vision. */
export interface SeriesStyle {
  readonly colour: PaletteName;
  /** SVG stroke-dasharray; '' for a solid line. */
  readonly dash: string;
  /** Stroke width in pixels. */
  readonly width: number;
  readonly marker: MarkerShape | null;
}

export interface AxisTick {
  readonly value: number;
  /** Pixel position along the axis (x from the figure's left, y from its top). */
  readonly position: number;
  readonly label: string;
}

export interface AxisModel {
  /** What is plotted, e.g. 'Block length n'. */
  readonly label: string;
  /** Unit shown after the label, e.g. 'nat/symbol'; '' when dimensionless. */
  readonly unit: string;
  readonly domain: readonly [number, number];
  readonly ticks: readonly AxisTick[];
}

/**
 * One plotted value in data units (not pixels), kept beside the marks so a figure's numbers can be
 * written out (CSV) exactly as drawn. A line or point has y; a band has lower and upper; a
 * histogram bar has y (the count) over x..x2.
 */
export interface DataRow {
  readonly x: number;
  readonly x2: number | null;
  readonly y: number | null;
  readonly lower: number | null;
  readonly upper: number | null;
}

/** A polyline (with gaps) as SVG path data; a canvas can draw the same string through Path2D. */
export interface LineMark {
  readonly id: string;
  readonly label: string;
  readonly style: SeriesStyle;
  readonly path: string;
  /** Pixel positions of the data points, where the style puts a marker on them (empty otherwise). */
  readonly vertices: readonly { readonly x: number; readonly y: number }[];
  /** The drawn points in data units (gaps left out). */
  readonly data: readonly DataRow[];
}

/** A filled band between a lower and an upper curve, as one closed SVG path per contiguous stretch. */
export interface BandMark {
  readonly id: string;
  readonly label: string;
  readonly colour: PaletteName;
  readonly opacity: number;
  readonly path: string;
  /** The drawn stretch in data units (undefined ends left out). */
  readonly data: readonly DataRow[];
}

export interface PointMark {
  readonly id: string;
  readonly label: string;
  readonly style: SeriesStyle;
  readonly points: readonly { readonly x: number; readonly y: number }[];
  /** The same points in data units, in the same order. */
  readonly data: readonly DataRow[];
}

/** A shaded stretch of the x axis (e.g. the trusted range), pixel bounds. */
export interface SpanMark {
  readonly id: string;
  readonly label: string;
  readonly from: number;
  readonly to: number;
}

/** Many thin lines of one style; drawn to a canvas when `render` says so (more marks than SVG handles well). */
export interface PathLayer {
  readonly id: string;
  readonly label: string;
  readonly style: SeriesStyle;
  /** One SVG path string per sampled path. */
  readonly paths: readonly string[];
  /** Each path's drawn points in data units, in the order of `paths`. */
  readonly data: readonly (readonly DataRow[])[];
  /** Line segments in all paths together. */
  readonly segments: number;
  readonly render: 'svg' | 'canvas';
}

export type LegendKind = 'line' | 'band' | 'points' | 'span' | 'paths';

export interface LegendEntry {
  readonly id: string;
  readonly label: string;
  readonly kind: LegendKind;
  readonly colour: PaletteName;
  readonly style: SeriesStyle | null;
  /** Fill opacity of a band's swatch (the band's own); null for other kinds. */
  readonly opacity: number | null;
}

export interface ReadoutRow {
  readonly id: string;
  readonly label: string;
  readonly value: string;
}

/** What the hover (or keyboard) read-out shows at one stop along x: a block length by default. */
export interface ReadoutStop {
  /** Block length; for a figure whose x is not n, the stop's index (and `heading` names the x value). */
  readonly n: number;
  /** Pixel x of this stop. */
  readonly x: number;
  /** The x value in words, for figures whose x is not the block length. */
  readonly heading?: ReadoutRow;
  readonly rows: readonly ReadoutRow[];
}

/** Everything a renderer needs to draw one figure; plain data, no DOM. */
export interface FigureModel {
  readonly title: string;
  /** One or two sentences saying what the figure shows, for screen readers and SVG <desc>. */
  readonly description: string;
  readonly size: FigureSize;
  readonly plot: PlotArea;
  readonly x: AxisModel;
  readonly y: AxisModel;
  readonly spans: readonly SpanMark[];
  readonly bands: readonly BandMark[];
  readonly pathLayer: PathLayer | null;
  readonly lines: readonly LineMark[];
  readonly points: readonly PointMark[];
  readonly legend: readonly LegendEntry[];
  readonly readout: readonly ReadoutStop[];
  /** Plain remarks to show beside the figure (e.g. why a series is missing). */
  readonly notes: readonly string[];
}

/** A figure, or the plain reason there is none. */
export type Figure = { readonly kind: 'figure'; readonly model: FigureModel } | { readonly kind: 'unavailable'; readonly message: string };
