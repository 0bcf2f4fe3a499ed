import { describe, expect, it } from 'vitest';
import { analyzeSequence } from '../../../src/core/analyze';
import { DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import { readSession } from '../../../src/core/session/readSession';
import { sessionOf } from '../../../src/core/session/session';
import { SessionError } from '../../../src/core/session/sessionError';
import { writeSession } from '../../../src/core/session/writeSession';
import { markovSource } from '../../../src/core/sources/markovSource';

function sessionText(): string {
  const seq = markovSource([
    [0.9, 0.1],
    [0.4, 0.6],
  ]).generate(20_000, 3);
  const result = analyzeSequence(seq, { name: 'chain', sha256: null, format: 'generated' }, { ...DEFAULT_SETTINGS, maxN: 16 });
  return writeSession(sessionOf({ result, settings: DEFAULT_SETTINGS, view: {}, reading: {}, savedAt: '2026-12-01T10:00:00.000Z' }));
}

describe('sessions with diagnostics', () => {
  it('round-trip the diagnostics exactly', () => {
    const text = sessionText();
    const back = readSession(text);
    expect(back.result.diagnostics?.reading.text.length).toBeGreaterThan(20);
    expect(JSON.stringify(back.result.diagnostics)).toBe(JSON.stringify(JSON.parse(text).result.diagnostics));
  });
  it('reject damaged diagnostics with the field path', () => {
    const json = JSON.parse(sessionText());
    json.result.diagnostics.reading = 7;
    try {
      readSession(JSON.stringify(json));
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SessionError);
      expect((e as SessionError).field).toBe('result.diagnostics.reading');
    }
  });
  it('accept results saved before diagnostics existed', () => {
    const json = JSON.parse(sessionText());
    delete json.result.diagnostics;
    expect(readSession(JSON.stringify(json)).result.diagnostics).toBeUndefined();
  });
});
