import { ReadError } from '../sequence/readError';
import type { InputPosition } from '../sequence/readError';
import type { NumericCellKind } from './numericCell';

/**
 * The error for a cell that is neither a finite number nor a missing value, at its position.
 * @param first the series' first cell: text there most often means a file of symbols read as
 *   numbers, so the message says how to read it as symbols instead
 */
export function numericCellError(kind: Exclude<NumericCellKind, 'number' | 'missing'>, text: string, position: InputPosition, first = false): ReadError {
  const shown = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  if (kind === 'infinite') {
    return new ReadError('bad-number', `'${shown}' is infinite; only finite numbers can be symbolized (write a missing value as an empty cell, NaN or NA)`, position);
  }
  const symbols = first ? '; if the file holds symbols rather than numbers, read it without a symbolization' : '';
  return new ReadError('bad-number', `'${shown}' is not a number; write decimals like -1.25 or 3e-4, and missing values as an empty cell, NaN or NA${symbols}`, position);
}
