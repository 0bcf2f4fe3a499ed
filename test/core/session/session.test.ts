import { describe, expect, it } from 'vitest';
import { numberDifferences } from '../../helpers/numberDifferences';
import { sessionErrorOf } from '../../helpers/sessionErrorOf';
import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';
import { analyzeSequence } from '../../../src/core/analyze';
import { createDigestingReader } from '../../../src/core/sequence/digestingReader';
import { ANALYSIS_SCHEMA, DEFAULT_SETTINGS } from '../../../src/core/result/analysisResult';
import type { AnalysisResult } from '../../../src/core/result/analysisResult';
import { PROGRAM_VERSION } from '../../../src/core/result/version';
import { readSession, looksLikeSession } from '../../../src/core/session/readSession';
import { SESSION_SCHEMA, sessionOf } from '../../../src/core/session/session';
import type { Session } from '../../../src/core/session/session';
import { writeSession } from '../../../src/core/session/writeSession';
import { randomSymbols } from '../../helpers/estimateFixtures';

// Token names meant to break naive writers: quotes, commas, markup, line breaks, non-ASCII.
const HOSTILE = ['"quoted"', 'a,b', '<script>alert(1)</script>', 'line\nbreak', 'tab\there', 'ünï€😀', '\\back'];
const HOSTILE_FILE = 'my "data", <script>x</script>\n€.txt';

/** A real analysis of a token file whose tokens are the hostile names (white space turned to '_'; the token reader splits at commas, so those go into the file name). */
function hostileResult(): AnalysisResult {
  const ids = randomSymbols(3_000, HOSTILE.length, 7);
  const text = Array.from(ids, (id) => HOSTILE[id % HOSTILE.length]!.replace(/\s/g, '_')).join(' ');
  const reader = createDigestingReader({ format: 'tokens' });
  reader.push(new TextEncoder().encode(text));
  const read = reader.finish();
  return analyzeSequence(read.sequence, { name: HOSTILE_FILE, sha256: read.sha256, format: 'tokens' }, { ...DEFAULT_SETTINGS, maxN: 12 });
}

function session(result: AnalysisResult = hostileResult()): Session {
  return sessionOf({
    result,
    settings: { ...DEFAULT_SETTINGS, unit: 'bit' },
    view: { z: 2, showPaths: false, fluctuationN: null, note: HOSTILE.join('|') },
    reading: { format: 'tokens', csvColumn: 'a,"b"' },
    savedAt: '2026-12-01T10:00:00.000Z',
  });
}

describe('session round trip', () => {
  it('writeSession then readSession gives a deep-equal session: numbers, nulls in paths and hostile names identical', () => {
    const s = session();
    expect(s.result.paths.logReturn.flat().some((v) => v === null)).toBe(true);
    expect(s.result.input.alphabet?.map((a) => a.symbol)).toEqual(expect.arrayContaining(['"quoted"', '<script>alert(1)</script>', 'ünï€😀', '\\back']));
    const back = readSession(writeSession(s));
    expect(back).toEqual(s);
    // Numbers compared with Object.is, so -0 against 0 or a lost digit would show; lists every difference.
    expect(numberDifferences(s, back)).toEqual([]);
    expect(back.result.input.name).toBe(HOSTILE_FILE);
    expect(back.view['note']).toBe(HOSTILE.join('|'));
  });

  it('the written JSON is 2-space indented, starts with the schema, and keys of nested objects are sorted (same bytes however built)', () => {
    const s = session();
    const text = writeSession(s);
    expect(text.startsWith(`{\n  "schema": "${SESSION_SCHEMA}",\n  "program": {`)).toBe(true);
    expect(looksLikeSession(text.slice(0, 200))).toBe(true);
    const reordered = JSON.parse(JSON.stringify({ ...s, result: Object.fromEntries(Object.entries(s.result).reverse()) })) as Session;
    expect(writeSession(reordered)).toBe(text);
    // Hostile names are escaped JSON strings, never raw line breaks or unbalanced quotes.
    expect(text).toContain(JSON.stringify(HOSTILE_FILE));
    expect(text.split('\n').every((line) => !line.includes('line\nbreak'))).toBe(true);
  });

  it('the session carries the program version and the input SHA-256 of the bytes read', () => {
    const s = session();
    expect(s.program).toEqual({ name: 'returnrate', version: PROGRAM_VERSION });
    // SHA-256 of the same bytes from @noble/hashes directly (FIPS 180-4 implementation, independent of the reader).
    const ids = randomSymbols(3_000, HOSTILE.length, 7);
    const text = Array.from(ids, (id) => HOSTILE[id % HOSTILE.length]!.replace(/\s/g, '_')).join(' ');
    expect(s.result.input.sha256).toBe(bytesToHex(sha256(new TextEncoder().encode(text))));
  });
});

describe('readSession refuses bad files with a clear message', () => {
  const good = (): Record<string, unknown> => JSON.parse(writeSession(session())) as Record<string, unknown>;

  it('not JSON: says so with the line and column of the error', () => {
    // A missing comma: the engine reports the offset of the next key (line 3, column 3).
    const e = sessionErrorOf('{\n  "schema": "returnrate.session/1"\n  "program": {}\n}');
    expect(e.code).toBe('not-json');
    expect(e.line).toBe(3);
    expect(e.column).toBe(3);
    expect(e.message).toMatch(/^this file is not a returnrate session: it is not valid JSON at line 3, column 3 \(/);
    // A message without a position still says it is not JSON.
    expect(sessionErrorOf('{"schema": oops}').message).toMatch(/^this file is not a returnrate session: it is not valid JSON/);
  });

  it('JSON that is not a session, and an analysis result instead of a session', () => {
    expect(sessionErrorOf('[1, 2]').message).toBe('this file is not a returnrate session: it holds an array, not an object');
    expect(sessionErrorOf('{"a": 1}').message).toBe(`this file is not a returnrate session: it has no "schema": "${SESSION_SCHEMA}" field`);
    expect(sessionErrorOf(JSON.stringify({ schema: ANALYSIS_SCHEMA })).message).toMatch(/is an analysis result .* not a session/);
  });

  it('a newer or an older session schema names both versions', () => {
    const newer = sessionErrorOf(JSON.stringify({ ...good(), schema: 'returnrate.session/2' }));
    expect(newer.code).toBe('schema-version');
    expect(newer.message).toBe('this session was saved by a newer returnrate (schema returnrate.session/2); this version reads returnrate.session/1');
    expect(sessionErrorOf(JSON.stringify({ ...good(), schema: 'returnrate.session/0' })).message).toBe(
      'this session was saved by an older returnrate (schema returnrate.session/0); this version reads returnrate.session/1',
    );
  });

  it('the embedded result must have the analysis schema this version reads', () => {
    const s = good();
    const e = sessionErrorOf(JSON.stringify({ ...s, result: { ...(s['result'] as object), schema: 'returnrate.analysis/9' } }));
    expect(e.code).toBe('schema-version');
    expect(e.message).toBe('the analysis inside this session has schema "returnrate.analysis/9"; this version reads returnrate.analysis/1');
  });

  it('a missing or mistyped field is named by its path', () => {
    const s = good();
    const result = s['result'] as Record<string, unknown>;
    const cases: [Record<string, unknown>, string, string][] = [
      [{ ...s, savedAt: undefined }, 'savedAt', 'the session is damaged: savedAt should be a string but is a undefined'],
      [{ ...s, savedAt: 'yesterday' }, 'savedAt', 'the session is damaged: savedAt should be a date and time (ISO 8601) but is a string'],
      [{ ...s, settings: { ...(s['settings'] as object), unit: 'furlong' } }, 'settings.unit', 'the session is damaged: settings.unit should be "nat" or "bit" but is a string'],
      [{ ...s, view: null }, 'view', 'the session is damaged: view should be an object but is null'],
      [{ ...s, result: { ...result, lengths: [...(result['lengths'] as object[]).slice(0, 2), { ...(result['lengths'] as object[])[2], n: '3' }] } }, 'result.lengths[2].n', 'the session is damaged: result.lengths[2].n should be a number but is a string'],
      [{ ...s, result: { ...result, paths: { positions: [0], logReturn: [[1, 'x']] } } }, 'result.paths.logReturn[0][1]', 'the session is damaged: result.paths.logReturn[0][1] should be a number or null but is a string'],
      [{ ...s, result: { ...result, input: { ...(result['input'] as object), sha256: 'abc' } } }, 'result.input.sha256', 'the session is damaged: result.input.sha256 should be 64 lower-case hex digits or null but is a string'],
      [{ ...s, result: { ...result, entropy: undefined } }, 'result.entropy', 'the session is damaged: result.entropy should be an object but is a undefined'],
    ];
    for (const [bad, field, message] of cases) {
      const e = sessionErrorOf(JSON.stringify(bad));
      expect(e.code).toBe('invalid-field');
      expect(e.field).toBe(field);
      expect(e.message).toBe(message);
    }
  });
});

describe('session with a symbolized input', () => {
  const symbolization = { spec: 'quantile:4', cutPoints: [0.5, 1, 2], cells: [{ label: 'q1', count: 3 }], values: 12, missing: 1, missingPolicy: 'skip', segments: 1, segmentsDropped: 0 };

  it('keeps input.symbolization through a write and a read', () => {
    const result = hostileResult();
    const withSymbolization = { ...result, input: { ...result.input, symbolization: { ...symbolization, missingPolicy: 'skip' as const } } };
    expect(readSession(writeSession(session(withSymbolization))).result.input.symbolization).toEqual(symbolization);
  });

  it('refuses a symbolization with an unknown missing-value policy, naming the field', () => {
    const text = writeSession(session()).replace('"format": "tokens",', `"format": "tokens",\n"symbolization": ${JSON.stringify({ ...symbolization, missingPolicy: 'zero' })},`);
    const error = sessionErrorOf(text);
    expect(error.code).toBe('invalid-field');
    expect(error.message).toContain('result.input.symbolization.missingPolicy');
  });
});

