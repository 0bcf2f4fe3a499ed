import { writeFile } from 'node:fs/promises';
import type { AnalysisResult } from '../core';
import { reportHtml } from '../figures';
import { OutputError } from './outputStream';
import { writeFailureReason } from './writeFigures';

/**
 * `--report PATH.html`: the one-file HTML report of the result, dated now (UTC, ISO 8601).
 * @param columns the CSV column read (--column), checked for a physiological name like the file name
 */
export async function writeReport(result: AnalysisResult, path: string, columns: readonly string[] = []): Promise<void> {
  const html = reportHtml(result, { date: new Date().toISOString(), columns });
  try {
    await writeFile(path, html, 'utf8');
  } catch (e) {
    throw new OutputError(`${path}: cannot write the report (${writeFailureReason(e)})`, { cause: e });
  }
}
