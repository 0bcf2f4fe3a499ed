/**
 * Waiting times straight from the definition, O(|A| |B| n) per level: W_n(i) = 1 + the least j with
 * B[j..j+n) = A[i..i+n), or 0 when no such j <= |B| - n exists (censored). Row n - 1 holds the
 * |A| - n + 1 values of level n. The oracle for scanWaitingTimes; meant for sequences of a few
 * hundred symbols.
 */
export function bruteWaiting(a: ArrayLike<number>, b: ArrayLike<number>, maxN: number): Int32Array[] {
  const N = a.length;
  const M = b.length;
  const rows: Int32Array[] = [];
  for (let n = 1; n <= maxN; n++) {
    const row = new Int32Array(N - n + 1);
    for (let i = 0; i + n <= N; i++) {
      for (let j = 0; j + n <= M; j++) {
        let same = true;
        for (let t = 0; t < n && same; t++) same = a[i + t] === b[j + t];
        if (same) {
          row[i] = j + 1;
          break;
        }
      }
    }
    rows.push(row);
  }
  return rows;
}
