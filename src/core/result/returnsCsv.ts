/**
 * Return times of single positions as CSV: `position,return_time,censored`. For a censored
 * position return_time is the lower bound c (only R > c is known) and censored is 1.
 * @throws RangeError when the arrays differ in length
 */
export function returnsCsv(positions: ArrayLike<number>, returnTimes: ArrayLike<number>, censored: ArrayLike<boolean | number>): string {
  if (positions.length !== returnTimes.length || positions.length !== censored.length) {
    throw new RangeError(
      `positions, returnTimes and censored must have equal lengths; got ${positions.length}, ${returnTimes.length}, ${censored.length}`,
    );
  }
  const lines = new Array<string>(positions.length + 1);
  lines[0] = 'position,return_time,censored';
  for (let i = 0; i < positions.length; i++) {
    lines[i + 1] = `${positions[i]},${returnTimes[i]},${censored[i] ? 1 : 0}`;
  }
  return lines.join('\n') + '\n';
}

/**
 * The engine's captured level (ReturnScan.captured: forward R, or -(c + 1) when censored at c) as
 * CSV rows for positions 0, 1, ...
 */
export function capturedReturnsCsv(captured: Int32Array): string {
  const positions = new Int32Array(captured.length);
  const times = new Int32Array(captured.length);
  const censored = new Uint8Array(captured.length);
  for (let i = 0; i < captured.length; i++) {
    positions[i] = i;
    const r = captured[i];
    if (r > 0) times[i] = r;
    else {
      times[i] = -r - 1;
      censored[i] = 1;
    }
  }
  return returnsCsv(positions, times, censored);
}
