const HEADER = 'position,return_time,censored\n';

/**
 * The engine's captured level (ReturnScan.captured: forward R, or -(c + 1) when censored at c) as
 * CSV `position,return_time,censored` for positions 0, 1, ..., in chunks of `rowsPerChunk` rows so
 * 10^8 rows never become one string. A censored row holds the lower bound c (only R > c is known)
 * and censored = 1.
 */
export function* capturedReturnsCsv(captured: Int32Array, rowsPerChunk = 1 << 16): Generator<string> {
  if (!Number.isInteger(rowsPerChunk) || rowsPerChunk < 1) throw new RangeError(`rowsPerChunk must be a positive integer; got ${rowsPerChunk}`);
  let chunk = HEADER;
  for (let i = 0; i < captured.length; i++) {
    const r = captured[i];
    chunk += r > 0 ? `${i},${r},0\n` : `${i},${-r - 1},1\n`;
    if ((i + 1) % rowsPerChunk === 0) {
      yield chunk;
      chunk = '';
    }
  }
  if (chunk !== '') yield chunk;
}
