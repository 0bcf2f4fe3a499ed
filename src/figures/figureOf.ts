import type { Figure, FigureModel } from './figureModel';

/** Marks and remarks a figure may leave out; each defaults to none. */
type Optional = 'spans' | 'bands' | 'pathLayer' | 'points' | 'legend' | 'readout' | 'notes';

/** A figure model's parts, where only what the figure draws need be given. */
export type FigureParts = Omit<FigureModel, Optional> & Partial<Pick<FigureModel, Optional>>;

/** A drawable figure from its parts, with no spans, bands, path layer, points, legend, read-out or notes unless given. */
export function figureOf(parts: FigureParts): Figure {
  return {
    kind: 'figure',
    model: {
      title: parts.title,
      description: parts.description,
      size: parts.size,
      plot: parts.plot,
      x: parts.x,
      y: parts.y,
      spans: parts.spans ?? [],
      bands: parts.bands ?? [],
      pathLayer: parts.pathLayer ?? null,
      lines: parts.lines,
      points: parts.points ?? [],
      legend: parts.legend ?? [],
      readout: parts.readout ?? [],
      notes: parts.notes ?? [],
    },
  };
}
