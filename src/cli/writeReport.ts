import { writeFile } from 'node:fs/promises';
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
    throw new OutputError(`${path}: cannot write the report (${writeFailureReason(e)})`, { cause: e });
  }
}
