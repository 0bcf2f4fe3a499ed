import { stat, writeFile } from 'node:fs/promises';
import { dirname, resolve } from 'node:path';
import type { AnalysisResult, CalibrationResult } from '../core';
import { reportHtml } from '../figures';
import { OutputError } from './outputStream';
import { writeFailureReason } from './writeFigures';

/**
 * `--report PATH.html`: the one-file HTML report of the result, dated now (UTC, ISO 8601), with the
 * calibration when `--calibrate` ran.
 * @param columns the CSV column read (--column), checked for a physiological name like the file name
 */
export async function writeReport(
  result: AnalysisResult,
  path: string,
  columns: readonly string[] = [],
  calibration: CalibrationResult | null = null,
): Promise<void> {
  const html = reportHtml(result, { date: new Date().toISOString(), columns, calibration });
  try {
    await writeFile(path, html, 'utf8');
  } catch (e) {
    throw new OutputError(`${path}: cannot write the report (${await missingFolderReason(e, path) ?? writeFailureReason(e)})`, { cause: e });
  }
}

/**
 * ENOENT on writing a file has two causes the user fixes differently: its folder is missing, or the
 * folder exists and takes no new files (/proc, /sys). Null for other errors.
 */
async function missingFolderReason(e: unknown, path: string): Promise<string | null> {
  if ((e as NodeJS.ErrnoException | null)?.code !== 'ENOENT') return null;
  const folder = dirname(resolve(path));
  try {
    return (await stat(folder)).isDirectory() ? `${folder} takes no new files, ENOENT` : `${folder} is not a folder, ENOENT`;
  } catch {
    return `its folder ${folder} does not exist, ENOENT`;
  }
}
