import { describe, expect, it } from 'vitest';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { sessionOf } from '../../../src/core/session/session';
import { DEFAULT_READING } from '../../../src/ui/store/inputSlice';
import { dataCheckText, savedAtText } from '../../../src/ui/store/sessionSlice';
import { DEFAULT_VIEW } from '../../../src/ui/store/viewSlice';
import { fakeResult } from '../fixtures';
import { testStore } from './testStore';

const SHA = 'ab'.repeat(32);

function savedSession() {
  const result = fakeResult({ input: { name: 'walk.txt', symbols: 10, alphabetSize: 2, sha256: SHA, format: 'chars' } });
  return sessionOf({
    result,
    settings: { ...DEFAULT_SETTINGS, unit: 'bit', maxN: 12 },
    view: { ...DEFAULT_VIEW, showPaths: false, z: 3, unknownField: 'ignored' },
    reading: { ...DEFAULT_READING, format: 'chars' },
    savedAt: '2026-12-01T10:05:30.000Z',
  });
}

describe('session slice', () => {
  it('openSession shows the result, settings, reading choices and view of the session, and says when it was saved', () => {
    const s = testStore();
    s.completeRun(s.beginRun('x', 40), fakeResult());
    s.beginRun('running', 40);
    const session = savedSession();
    s.openSession(session);
    const state = s.store.getState();
    expect(state.result).toBe(session.result);
    expect(state.settings).toEqual({ ...DEFAULT_SETTINGS, unit: 'bit', maxN: 12 });
    expect(state.view).toEqual({ ...DEFAULT_VIEW, showPaths: false, z: 3 });
    expect(state.reading.format).toBe('chars');
    expect(state.run).toEqual({ status: 'idle', note: 'Opened session saved 2026-12-01 10:05 UTC.' });
    expect(state.partial).toBeNull();
    expect(state.session).toEqual({ savedAt: session.savedAt, inputName: 'walk.txt', sha256: SHA });
  });

  it('checkData says same or different data by SHA-256, and nothing without a session', () => {
    const s = testStore();
    s.checkData('a.txt', SHA);
    expect(s.store.getState().dataCheck).toBeNull();
    s.openSession(savedSession());
    s.checkData('a.txt', 'checking');
    expect(dataCheckText(s.store.getState().dataCheck!)).toBe("Checking whether “a.txt” is the session's data…");
    s.checkData('a.txt', SHA);
    expect(dataCheckText(s.store.getState().dataCheck!)).toBe('“a.txt”: same data as the session (SHA-256 matches).');
    s.checkData('b.txt', 'cd'.repeat(32));
    expect(dataCheckText(s.store.getState().dataCheck!)).toBe("“b.txt” is different data from the session's (SHA-256 differs).");
  });

  it('sessionFailed puts the reason in the failure alert and leaves the page as it was', () => {
    const s = testStore();
    const result = fakeResult();
    s.completeRun(s.beginRun('x', 40), result);
    s.sessionFailed('old.json', new Error('this session was saved by a newer returnrate'));
    expect(s.store.getState().failure).toEqual({ title: 'Could not open the session “old.json”', message: 'this session was saved by a newer returnrate' });
    expect(s.store.getState().result).toBe(result);
  });

  it('savedAtText gives UTC minutes, and the text itself when it is no date', () => {
    expect(savedAtText('2026-01-02T03:04:59.999Z')).toBe('2026-01-02 03:04 UTC');
    expect(savedAtText('whenever')).toBe('whenever');
  });
});
