import { describe, expect, it } from 'vitest';
import { resultForStorage, restoreResult } from '../../../src/ui/store/resultSlice';
import { fakeResult } from '../fixtures';

describe('result slice', () => {
  it('resultForStorage keeps a small result whole', () => {
    const state = { result: fakeResult(), pathsDropped: false };
    expect(resultForStorage(state)).toEqual(state);
  });

  it('resultForStorage drops the sampled paths of a result larger than the limit, and says so', () => {
    const result = fakeResult();
    const stored = resultForStorage({ result, pathsDropped: false }, 100);
    expect(stored.pathsDropped).toBe(true);
    expect(stored.result?.paths).toEqual({ positions: [], logReturn: [] });
    expect(stored.result?.entropy).toBe(result.entropy);
    expect(result.paths.positions).toEqual([0, 10]);
  });

  it('restoreResult accepts only results of the current schema', () => {
    const result = fakeResult();
    expect(restoreResult({ result, pathsDropped: true })).toEqual({ result, pathsDropped: true });
    expect(restoreResult({ result: { ...result, schema: 'returnrate.analysis/0' } })).toEqual({ result: null, pathsDropped: false });
    expect(restoreResult(undefined)).toEqual({ result: null, pathsDropped: false });
  });
});
