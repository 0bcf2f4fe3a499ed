import type { ComparisonResult } from '../core';
import { comparisonConvergenceFigure, comparisonQuantileFigure } from './comparisonFigures';
import { EXPORT_SIZE, type ExportedFigure } from './exportFigures';
import { figureCaption, type FigureCaption } from './figureCaption';
import type { FigureSize } from './figureModel';

/** The comparison views, in the order the workbench shows them; also the file stems. */
export const COMPARISON_FIGURE_IDS = ['compare-convergence', 'compare-qq'] as const;
export type ComparisonFigureId = (typeof COMPARISON_FIGURE_IDS)[number];

export type ExportedComparisonFigure = ExportedFigure<ComparisonFigureId>;

/** The name exported comparison files start with: both inputs, e.g. 'a.txt vs b.txt'. */
export function comparisonInputName(result: ComparisonResult): string {
  return `${result.inputA.name.replace(/\.[A-Za-z0-9]{1,8}$/, '')} vs ${result.inputB.name}`;
}

/** The caption of a comparison view: both inputs with their SHA-256, the settings, the segment pairs and (Q-Q) n and basis. */
export function comparisonCaption(id: ComparisonFigureId, result: ComparisonResult): FigureCaption {
  const fl = result.fluctuations;
  const view =
    id === 'compare-qq' && fl !== null
      ? `n = ${fl.n}, centred with the ${fl.basis === 'exact' ? 'exact' : 'estimated'} H and σ; ${result.pairs} segment pairs`
      : `${result.pairs} segment pairs`;
  const base = figureCaption({ input: { name: comparisonInputName(result), sha256: null }, settings: result.settings, program: result.program }, view);
  return {
    ...base,
    inputs: [
      { label: 'A', name: result.inputA.name, sha256: result.inputA.sha256 },
      { label: 'B', name: result.inputB.name, sha256: result.inputB.sha256 },
    ],
  };
}

/** Both comparison figures with their captions (tests; the workbench builds each at its own size). */
export function exportComparisonFigures(result: ComparisonResult, size: FigureSize = EXPORT_SIZE): ExportedComparisonFigure[] {
  return [
    { id: 'compare-convergence', figure: comparisonConvergenceFigure(result, size), caption: comparisonCaption('compare-convergence', result) },
    { id: 'compare-qq', figure: comparisonQuantileFigure(result, size), caption: comparisonCaption('compare-qq', result) },
  ];
}
