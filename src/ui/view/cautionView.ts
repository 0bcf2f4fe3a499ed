import { looksPhysiological, PHYSIOLOGICAL_CAUTION } from '../../figures';

/**
 * Column names worth checking for a physiological recording: the CSV column chosen by name, and
 * the header line of a CSV preview (one string: a match anywhere in it is enough).
 */
export function cautionColumns(format: string, csvColumn: string, headerLine: string | null = null): string[] {
  if (format !== 'csv') return [];
  const columns: string[] = [];
  if (csvColumn.trim() !== '') columns.push(csvColumn);
  if (headerLine !== null) columns.push(headerLine);
  return columns;
}

/** The research-estimate caution for data that looks physiological, else null. */
export function physiologicalCaution(input: { readonly name: string; readonly format: string }, columns: readonly string[] = []): string | null {
  return looksPhysiological(input, columns) ? PHYSIOLOGICAL_CAUTION : null;
}
