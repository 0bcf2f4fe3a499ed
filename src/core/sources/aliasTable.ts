/**
 * Walker's alias table for drawing from a finite law in constant time, built with Vose's stable
 * method (Walker, ACM TOMS 3 (1977); Vose, IEEE Trans. Softw. Eng. 17 (1991) 972-975, both from
 * memory). Draw: x = u * K for one uniform u in [0, 1), k = floor(x); return k when x - k <
 * threshold[k], else alias[k]. The fractional part reuses the low bits of u, leaving
 * 53 - log2(K) bits of resolution for the threshold, far below any statistical effect we measure.
 */
export interface AliasTable {
  readonly threshold: Float64Array;
  readonly alias: Int32Array;
}

/** Builds the alias table of a law given as probabilities summing to 1 (not checked here). */
export function buildAliasTable(probabilities: ArrayLike<number>): AliasTable {
  const k = probabilities.length;
  const scaled = new Float64Array(k);
  const threshold = new Float64Array(k);
  const alias = new Int32Array(k);
  const small = new Int32Array(k);
  const large = new Int32Array(k);
  let nSmall = 0;
  let nLarge = 0;
  for (let i = 0; i < k; i++) {
    scaled[i] = probabilities[i] * k;
    alias[i] = i;
    if (scaled[i] < 1) small[nSmall++] = i;
    else large[nLarge++] = i;
  }
  while (nSmall > 0 && nLarge > 0) {
    const s = small[--nSmall];
    const l = large[--nLarge];
    threshold[s] = scaled[s];
    alias[s] = l;
    scaled[l] = scaled[l] + scaled[s] - 1;
    if (scaled[l] < 1) small[nSmall++] = l;
    else large[nLarge++] = l;
  }
  // Whatever is left has scaled mass 1 up to rounding and keeps its own column, except a
  // zero-probability column stranded by rounding, which hands its cell to the likeliest symbol.
  let likeliest = 0;
  for (let i = 1; i < k; i++) if (probabilities[i] > probabilities[likeliest]) likeliest = i;
  while (nLarge > 0) threshold[large[--nLarge]] = 1;
  while (nSmall > 0) {
    const s = small[--nSmall];
    threshold[s] = probabilities[s] > 0 ? 1 : 0;
    alias[s] = probabilities[s] > 0 ? s : likeliest;
  }
  return { threshold, alias };
}
