import type { ReadWarning } from '../sequence/sequenceReader';
import type { SymbolizeSpec } from './symbolizeSpec';

/**
 * A warning when the symbols say less than the numbers: a series with zero range (every value
 * equal) gives one symbol whatever the symbolization, and ties can leave quantile cells empty.
 * @param values the series as read (at least one value)
 * @param alphabet the symbols that occur, in cell order
 * @returns null when every quantile cell is used and there are at least two symbols
 */
export function symbolizationWarning(values: Float64Array, spec: SymbolizeSpec, alphabet: readonly string[]): ReadWarning | null {
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    if (values[i] < min) min = values[i];
    if (values[i] > max) max = values[i];
  }
  const one = `the sequence has the one symbol '${alphabet[0]}' and an entropy rate of 0`;
  if (values.length > 1 && min === max) {
    const why =
      spec.kind === 'quantile'
        ? `${spec.cells === 2 ? 'the quantile cut point equals' : `the ${spec.cells - 1} quantile cut points all equal`} ${min}, and a value equal to a cut goes to the cell above`
        : spec.kind === 'threshold'
          ? 'every value falls in the same cell'
          : 'every window is all ties, and ties rank in time order';
    return { code: 'constant-series', message: `all ${values.length} values equal ${min} (zero range): ${why}, so ${one}` };
  }
  if (alphabet.length === 1) return { code: 'one-symbol', message: `${spec.kind === 'ordinal' ? 'every window has the same pattern' : 'every value falls in the same cell'}, so ${one}` };
  if (spec.kind === 'quantile' && alphabet.length < spec.cells) {
    return { code: 'empty-cells', message: `tied values make some quantile cut points equal: ${spec.cells - alphabet.length} of the ${spec.cells} cells are empty and the sequence has ${alphabet.length} symbols` };
  }
  return null;
}
