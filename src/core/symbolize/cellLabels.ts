/**
 * Labels of the cells cut by increasing cut points c_1..c_m, as the symbols of the sequence:
 * '<c_1', '[c_1,c_2)', ..., '>=c_m' (half-open, matching the rule of cellsByCuts). Numbers are
 * printed in their shortest round-trip form, so labels are exact.
 */
export function thresholdLabels(cuts: readonly number[]): string[] {
  const m = cuts.length;
  const labels: string[] = [`<${cuts[0]}`];
  for (let j = 1; j < m; j++) labels.push(`[${cuts[j - 1]},${cuts[j]})`);
  labels.push(`>=${cuts[m - 1]}`);
  return labels;
}

/** Labels of K quantile cells: 'q1' (lowest values) .. 'qK'. */
export function quantileLabels(cells: number): string[] {
  return Array.from({ length: cells }, (_, j) => `q${j + 1}`);
}
