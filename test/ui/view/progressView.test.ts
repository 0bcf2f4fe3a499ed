import { describe, expect, it } from 'vitest';
import { progressView } from '../../../src/ui/view/progressView';

describe('progressView', () => {
  it('shows idle with its note, or "Ready."', () => {
    expect(progressView({ status: 'idle', note: null })).toEqual({ status: 'Idle', detail: 'Ready.', value: 0, max: 1 });
    expect(progressView({ status: 'idle', note: 'Cancelled.' }).detail).toBe('Cancelled.');
  });

  it('is indeterminate before the first report', () => {
    expect(progressView({ status: 'running', id: 1, label: 'x', maxN: 40, progress: null }).value).toBeNull();
  });

  it('counts block lengths against maxN and bytes against the file size', () => {
    const level = progressView({ status: 'running', id: 1, label: 'x', maxN: 40, progress: { kind: 'level', n: 7, active: 12_345 } });
    expect(level).toEqual({ status: 'Running', detail: 'Block length n = 7 of at most 40 · 12,345 positions still active', value: 7, max: 40 });
    const read = progressView({ status: 'running', id: 1, label: 'f', maxN: 40, progress: { kind: 'read', bytes: 2048, totalBytes: 4096 } });
    expect(read).toMatchObject({ value: 2048, max: 4096, detail: 'Reading f: 2.0 KiB of 4.0 KiB' });
  });
});
