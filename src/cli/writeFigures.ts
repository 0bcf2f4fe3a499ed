import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { AnalysisResult, CalibrationResult } from '../core';
import { exportCalibrationFigure, exportDiagnosticFigures, exportFigures, figureCsv, figureSvg } from '../figures';
import { FolderError, makeFolder } from './makeFolder';
import { OutputError } from './outputStream';

const REASONS: Readonly<Record<string, string>> = {
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EEXIST: 'a file of that name is in the way',
  ENOTDIR: 'a file of that name is in the way',
  EROFS: 'read-only file system',
  ENOSPC: 'no space left on the device',
};

/** Why a write failed, in words, with the system's code. */
export function writeFailureReason(e: unknown): string {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  return code === undefined ? String((e as Error | null)?.message ?? e) : `${REASONS[code] ?? 'write failed'}, ${code}`;
}

/**
 * `--figures DIR`: one SVG and one CSV per view of the result, from the same figure models the
 * workbench draws (exportFigures, at EXPORT_SIZE with the workbench's default view options). The
 * folder is made when missing. A view that cannot be drawn (e.g. too few fluctuations) gets no
 * files and a note on standard error. With a calibration (`--calibrate`), `calibration` too.
 * Returns the paths written.
 */
export async function writeFigures(result: AnalysisResult, dir: string, note: (line: string) => void, calibration: CalibrationResult | null = null): Promise<string[]> {
  try {
    await makeFolder(dir);
  } catch (e) {
    const why = e instanceof FolderError ? e.message : writeFailureReason(e);
    throw new OutputError(`${dir}: cannot make the figures folder: ${why}`, { cause: e });
  }
  const written: string[] = [];
  const extra = calibration === null ? [] : [exportCalibrationFigure(calibration, result)];
  for (const { id, figure, caption } of [...exportFigures(result), ...exportDiagnosticFigures(result), ...extra]) {
    if (figure.kind !== 'figure') {
      note(`returnrate: note: figure ${id} not written: ${figure.message}`);
      continue;
    }
    for (const [ext, text] of [
      ['svg', figureSvg(figure.model, caption)],
      ['csv', figureCsv(id, figure.model, caption)],
    ] as const) {
      const path = join(dir, `${id}.${ext}`);
      try {
        await writeFile(path, text, 'utf8');
      } catch (e) {
        throw new OutputError(`${path}: cannot write (${writeFailureReason(e)})`, { cause: e });
      }
      written.push(path);
    }
  }
  return written;
}
