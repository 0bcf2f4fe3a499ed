import { describe, expect, it } from 'vitest';
import { numberDifferences } from '../../helpers/numberDifferences';
import { sessionErrorOf } from '../../helpers/sessionErrorOf';
import { readSession } from '../../../src/core/session/readSession';
import { sessionOf } from '../../../src/core/session/session';
import type { Session } from '../../../src/core/session/session';
import { writeSession } from '../../../src/core/session/writeSession';
import { calibrationBelongsTo } from '../../../src/core/session/calibrationBelongsTo';
import { extrasFixture, HOSTILE_NAME, HOSTILE_NAME_B } from '../../helpers/sessionExtrasFixtures';

type Json = Record<string, unknown>;

function session(extras: { calibration?: boolean; comparison?: boolean } = { calibration: true, comparison: true }): Session {
  const { result, calibration, comparison } = extrasFixture();
  return sessionOf({
    result,
    settings: result.settings,
    view: { showPaths: true },
    reading: { format: 'tokens' },
    savedAt: '2026-12-01T23:50:00.000Z',
    calibration: extras.calibration === true ? calibration : null,
    comparison: extras.comparison === true ? comparison : undefined,
  });
}

/** Counts nulls and numbers in a JSON-like value, to show the round trip had both to keep. */
function census(v: unknown, acc = { nulls: 0, numbers: 0 }): { nulls: number; numbers: number } {
  if (v === null) acc.nulls++;
  else if (typeof v === 'number') acc.numbers++;
  else if (typeof v === 'object') for (const x of Object.values(v)) census(x, acc);
  return acc;
}

describe('session with a calibration and a comparison', () => {
  it('the round trip keeps every number identical (Object.is), nulls and hostile names included', () => {
    const s = session();
    expect(s.calibration?.summary.replicates).toBe(10);
    const counted = census({ c: s.calibration, d: s.comparison });
    expect(counted.nulls).toBeGreaterThan(0);
    expect(counted.numbers).toBeGreaterThan(100);
    const back = readSession(writeSession(s));
    expect(back).toEqual(s);
    expect(numberDifferences(s, back)).toEqual([]);
    // Both directions: nothing was added on the way back either.
    expect(numberDifferences(back, s)).toEqual([]);
    expect(back.comparison?.inputA.name).toBe(HOSTILE_NAME);
    expect(back.comparison?.inputB.name).toBe(HOSTILE_NAME_B);
  });

  it('written after the result, calibration before comparison; absent parts leave no key, so the file reads like an older session', () => {
    const text = writeSession(session());
    const keys = Object.keys(JSON.parse(text) as Json);
    expect(keys).toEqual(['schema', 'program', 'savedAt', 'settings', 'reading', 'view', 'result', 'calibration', 'comparison']);
    const plain = writeSession(session({}));
    expect(plain).not.toContain('"calibration"');
    expect(plain).not.toContain('"comparison"');
    const back = readSession(plain);
    expect(back.calibration).toBeUndefined();
    expect(back.comparison).toBeUndefined();
    expect(readSession(writeSession(session({ comparison: true }))).calibration).toBeUndefined();
  });

  it('the calibration belongs to the result: same input and settings, whatever the key order of the settings', () => {
    const { result, calibration } = extrasFixture();
    expect(calibrationBelongsTo(calibration, result)).toBe(true);
    const reordered = { ...calibration, settings: Object.fromEntries(Object.entries(calibration.settings).reverse()) as typeof calibration.settings };
    expect(calibrationBelongsTo(reordered, result)).toBe(true);
    expect(calibrationBelongsTo({ ...calibration, settings: { ...calibration.settings, maxN: 11 } }, result)).toBe(false);
  });
});

describe('readSession names the damaged field of a calibration or comparison', () => {
  const good = (): Json => JSON.parse(writeSession(session())) as Json;
  const edit = (part: 'calibration' | 'comparison', change: (o: Json) => void): string => {
    const s = good();
    const copy = structuredClone(s[part]) as Json;
    change(copy);
    return JSON.stringify({ ...s, [part]: copy });
  };

  it('each mistyped field is named by its path, with what it should be', () => {
    const cases: [string, string, string][] = [
      [edit('calibration', (c) => (c['schema'] = 'returnrate.calibration/7')), 'calibration.schema', 'should be "returnrate.calibration/1" but is a string'],
      [edit('calibration', (c) => ((c['model'] as Json)['entropyRate'] = 'high')), 'calibration.model.entropyRate', 'should be a number but is a string'],
      [edit('calibration', (c) => (((c['model'] as Json)['scores'] as Json[])[0]!['bic'] = null)), 'calibration.model.scores[0].bic', 'should be a number but is null'],
      [edit('calibration', (c) => ((c['records'] as Json[])[3]!['entropyInterval'] = [1])), 'calibration.records[3].entropyInterval', 'should be a pair of numbers or null but is an array'],
      [edit('calibration', (c) => ((c['records'] as Json[])[2]!['entropy'] = '0.4')), 'calibration.records[2].entropy', 'should be a number or null but is a string'],
      [edit('calibration', (c) => (((c['summary'] as Json)['entropy'] as Json)['coverage'] = true)), 'calibration.summary.entropy.coverage', 'should be a number or null but is a boolean'],
      [edit('calibration', (c) => (((c['summary'] as Json)['correctedEntropy'] as Json)['interval'] = null)), 'calibration.summary.correctedEntropy.interval', 'should be a pair of numbers but is null'],
      [edit('calibration', (c) => (c['partial'] = 'no')), 'calibration.partial', 'should be true or false but is a string'],
      [edit('calibration', (c) => ((c['input'] as Json)['sha256'] = 'xyz')), 'calibration.input.sha256', 'should be 64 lower-case hex digits or null but is a string'],
      [edit('comparison', (c) => (c['schema'] = null)), 'comparison.schema', 'should be "returnrate.comparison/1" but is null'],
      [edit('comparison', (c) => ((c['inputB'] as Json)['name'] = 5)), 'comparison.inputB.name', 'should be a string but is a number'],
      [edit('comparison', (c) => ((c['lengths'] as Json[])[1]!['meanLogWait'] = {})), 'comparison.lengths[1].meanLogWait', 'should be a number or null but is an object'],
      [edit('comparison', (c) => ((c['crossEntropy'] as Json)['ci95'] = 'wide')), 'comparison.crossEntropy.ci95', 'should be a pair of numbers or null but is a string'],
      [edit('comparison', (c) => ((c['entropyA'] as Json)['method'] = undefined)), 'comparison.entropyA.method', 'should be a string but is a undefined'],
      [edit('comparison', (c) => ((c['alphabet'] as Json)['missingInB'] = [1])), 'comparison.alphabet.missingInB[0]', 'should be a string but is a number'],
      [edit('comparison', (c) => (c['exact'] = { source: 'x' })), 'comparison.exact.crossEntropy', 'should be a number but is a undefined'],
      [edit('comparison', (c) => (c['warnings'] = {})), 'comparison.warnings', 'should be an array but is an object'],
    ];
    for (const [text, field, should] of cases) {
      const e = sessionErrorOf(text);
      expect(e.code).toBe('invalid-field');
      expect(e.field).toBe(field);
      expect(e.message).toBe(`the session is damaged: ${field} ${should}`);
    }
  });

  it('a calibration of other data or other settings is refused, naming the field that differs', () => {
    const otherData = sessionErrorOf(edit('calibration', (c) => ((c['input'] as Json)['sha256'] = 'a'.repeat(64))));
    expect(otherData.field).toBe('calibration.input.sha256');
    expect(otherData.message).toBe(
      "the session is damaged: calibration.input.sha256 differs from result.input.sha256, so the calibration does not belong to the session's result",
    );
    expect(sessionErrorOf(edit('calibration', (c) => ((c['settings'] as Json)['maxN'] = 30))).field).toBe('calibration.settings.maxN');
    expect(sessionErrorOf(edit('calibration', (c) => ((c['input'] as Json)['symbols'] = 2999))).field).toBe('calibration.input.symbols');
  });

  it('a calibration or comparison that is not an object is refused', () => {
    const s = good();
    expect(sessionErrorOf(JSON.stringify({ ...s, calibration: [] })).message).toBe('the session is damaged: calibration should be an object but is an array');
    expect(sessionErrorOf(JSON.stringify({ ...s, comparison: 'none' })).message).toBe('the session is damaged: comparison should be an object but is a string');
  });
});
