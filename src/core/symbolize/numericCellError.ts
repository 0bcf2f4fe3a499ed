import { ReadError } from '../sequence/readError';
import type { InputPosition } from '../sequence/readError';
import type { NumericCellKind } from './numericCell';

/** The error for a cell that is neither a finite number nor a missing value, at its position. */
export function numericCellError(kind: Exclude<NumericCellKind, 'number' | 'missing'>, text: string, position: InputPosition): ReadError {
  const shown = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  if (kind === 'infinite') {
    return new ReadError('bad-number', `'${shown}' is infinite; only finite numbers can be symbolized (write a missing value as an empty cell, NaN or NA)`, position);
  }
  return new ReadError('bad-number', `'${shown}' is not a number; write decimals like -1.25 or 3e-4, and missing values as an empty cell, NaN or NA`, position);
}
