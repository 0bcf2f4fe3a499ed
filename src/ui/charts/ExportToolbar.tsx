import { useState } from 'react';
import {
  diagnosticCaption,
  exportCaption,
  figureCsv,
  figureSvg,
  isDiagnosticFigureId,
  type CalibrationFigureId,
  type ComparisonFigureId,
  type DiagnosticFigureId,
  type ExportFigureId,
  type FigureCaption,
  type FigureModel,
} from '../../figures';
import { downloadBlob } from '../../export/downloadBlob';
import { exportFileName } from '../../export/exportFileName';
import { svgToPng } from '../../export/svgToPng';
import { useAppState } from '../store/store';

const PNG_SCALES = [1, 2, 4] as const;

/**
 * Download buttons under a figure: the standalone SVG, PNGs at 1x, 2x and 4x, and the plotted numbers
 * as CSV. The files are made from the same model the page draws, with a caption naming the result's
 * input, SHA-256, settings and the view options; nothing leaves the browser.
 */
export function ExportToolbar({
  model,
  figureId,
  caption: ownCaption,
}: {
  readonly model: FigureModel;
  readonly figureId: ExportFigureId | DiagnosticFigureId | CalibrationFigureId | ComparisonFigureId;
  /** A figure not drawn from the shown result (calibration, comparison) brings its own caption; its input name starts the file names. */
  readonly caption?: FigureCaption | undefined;
}) {
  const result = useAppState((s) => s.result);
  const view = useAppState((s) => s.view);
  const [problem, setProblem] = useState<string | null>(null);
  let caption: FigureCaption;
  if (ownCaption !== undefined) caption = ownCaption;
  else if (result === null || figureId === 'calibration' || figureId === 'compare-convergence' || figureId === 'compare-qq') return null;
  else caption = isDiagnosticFigureId(figureId) ? diagnosticCaption(figureId, result) : exportCaption(figureId, result, view);
  const name = (ext: string): string => exportFileName(caption.inputName, figureId, ext);
  const svg = (): string => figureSvg(model, caption);
  const run = (work: () => Promise<void> | void) => () => {
    setProblem(null);
    Promise.resolve()
      .then(work)
      .catch((e: unknown) => setProblem(`The file could not be made: ${e instanceof Error ? e.message : String(e)}`));
  };
  return (
    <div className="export-toolbar" role="toolbar" aria-label={`Export: ${model.title}`}>
      <button type="button" onClick={run(() => downloadBlob(new Blob([svg()], { type: 'image/svg+xml' }), name('svg')))}>
        Download SVG
      </button>
      {PNG_SCALES.map((scale) => (
        <button key={scale} type="button" onClick={run(async () => downloadBlob(await svgToPng(svg(), scale), name(scale === 1 ? 'png' : `${scale}x.png`)))}>
          PNG {scale}x
        </button>
      ))}
      <button type="button" onClick={run(() => downloadBlob(new Blob([figureCsv(figureId, model, caption)], { type: 'text/csv' }), name('csv')))}>
        Download CSV
      </button>
      {problem !== null && (
        <p className="field-error" role="alert">
          {problem}
        </p>
      )}
    </div>
  );
}
