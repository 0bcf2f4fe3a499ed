import { describe, expect, it } from 'vitest';
import { compareSequences } from '../../../src/core/cross/compareSequences';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { parseSourceSpec } from '../../../src/core/sources/catalog';
import { restoreComparisonResult } from '../../../src/ui/store/comparisonSlice';
import { bindActions, createAppStore, memoryStorage } from '../../../src/ui/store/store';

function smallComparison() {
  const a = parseSourceSpec('coin').generate(3_000, 1);
  const facts = { name: 'x', sha256: null, format: 'generated' };
  return compareSequences(a, parseSourceSpec('coin').generate(3_000, 2), facts, facts, { ...DEFAULT_SETTINGS, maxN: 12 });
}

describe('comparison slice', () => {
  it('goes running -> idle with the result, keeps the last result when a later run is cancelled, and saves it across a reload', async () => {
    const storage = memoryStorage();
    const store = createAppStore(() => storage);
    const actions = bindActions(store);
    actions.chooseCompareSide('A', { kind: 'source', spec: 'coin', label: 'Fair coin', length: 3000 });
    actions.beginComparison();
    expect(store.getState().comparisonRun.status).toBe('running');
    actions.reportComparisonProgress({ stage: 'waiting', done: 3, total: 5 });
    expect(store.getState().comparisonRun.progress?.done).toBe(3);
    const result = smallComparison();
    actions.completeComparison(result);
    expect(store.getState().comparisonResult).toBe(result);
    actions.beginComparison();
    actions.cancelComparison();
    expect(store.getState().comparisonRun.status).toBe('cancelled');
    expect(store.getState().comparisonResult).toBe(result);
    await new Promise((r) => setTimeout(r, 0));
    const reloaded = createAppStore(() => storage);
    await new Promise((r) => setTimeout(r, 0));
    expect(reloaded.getState().comparisonResult?.crossEntropy).toEqual(result.crossEntropy);
  });

  it('restores only results with the comparison schema', () => {
    expect(restoreComparisonResult({ schema: 'returnrate.analysis/1', lengths: [] })).toBeNull();
    expect(restoreComparisonResult(null)).toBeNull();
    const result = smallComparison();
    expect(restoreComparisonResult(JSON.parse(JSON.stringify(result)))).toEqual(JSON.parse(JSON.stringify(result)));
  });
});
