import { ANALYSIS_SCHEMA } from '../result/analysisResult';
import type { AnalysisResult } from '../result/analysisResult';
import { sessionCalibration, sessionComparison } from './readSessionExtras';
import type { Session } from './session';
import { SESSION_SCHEMA } from './session';
import { SessionError } from './sessionError';

const SESSION_SCHEMA_PATTERN = /^returnrate\.session\/(\d+)$/;
const THIS_VERSION = Number(SESSION_SCHEMA_PATTERN.exec(SESSION_SCHEMA)?.[1]);
/** V8 says "... at position 42 (line 3 column 5)", older V8 "... at position 42", SpiderMonkey "... at line 3 column 5 of the JSON data". */
const LINE_COLUMN = /line (\d+) column (\d+)/;
const POSITION = /at position (\d+)/;
const SHA256_HEX = /^[0-9a-f]{64}$/;

/** Line and column (1-based) of a JSON syntax error, from the engine's message where it gives them. */
function syntaxPosition(text: string, message: string): { line?: number; column?: number } {
  const lc = LINE_COLUMN.exec(message);
  if (lc !== null) return { line: Number(lc[1]), column: Number(lc[2]) };
  const pos = POSITION.exec(message);
  if (pos === null) return {};
  const offset = Math.min(Number(pos[1]), text.length);
  const before = text.slice(0, offset);
  const lastBreak = before.lastIndexOf('\n');
  return { line: before.split('\n').length, column: offset - lastBreak };
}

function parse(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const where = syntaxPosition(text, message);
    const at = where.line === undefined ? '' : ` at line ${where.line}, column ${where.column}`;
    throw new SessionError('not-json', `this file is not a returnrate session: it is not valid JSON${at} (${message})`, where);
  }
}

type Obj = Record<string, unknown>;

const at = (path: string, key: string): string => (path === '' ? key : `${path}.${key}`);

const kindOf = (v: unknown): string => (v === null ? 'null' : Array.isArray(v) ? 'an array' : typeof v === 'object' ? 'an object' : `a ${typeof v}`);

function invalid(path: string, expected: string, value: unknown): never {
  throw new SessionError('invalid-field', `the session is damaged: ${path} should be ${expected} but is ${kindOf(value)}`, { field: path });
}

function object(value: unknown, path: string): Obj {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) invalid(path, 'an object', value);
  return value as Obj;
}

function array(value: unknown, path: string): readonly unknown[] {
  if (!Array.isArray(value)) invalid(path, 'an array', value);
  return value;
}

function num(o: Obj, key: string, path: string, nullable = false): void {
  const v = o[key];
  if (nullable && v === null) return;
  if (typeof v !== 'number' || !Number.isFinite(v)) invalid(at(path, key), nullable ? 'a number or null' : 'a number', v);
}

function str(o: Obj, key: string, path: string, nullable = false): void {
  const v = o[key];
  if (nullable && v === null) return;
  if (typeof v !== 'string') invalid(at(path, key), nullable ? 'a string or null' : 'a string', v);
}

function bool(o: Obj, key: string, path: string): void {
  if (typeof o[key] !== 'boolean') invalid(at(path, key), 'true or false', o[key]);
}

function numbersOrNull(value: unknown, path: string): void {
  array(value, path).forEach((v, i) => {
    if (v !== null && (typeof v !== 'number' || !Number.isFinite(v))) invalid(`${path}[${i}]`, 'a number or null', v);
  });
}

function pair(value: unknown, path: string, nullable = false): void {
  if (nullable && value === null) return;
  const a = array(value, path);
  if (a.length !== 2 || typeof a[0] !== 'number' || typeof a[1] !== 'number') invalid(path, 'a pair of numbers', value);
}

function program(value: unknown, path: string): void {
  const p = object(value, path);
  if (p['name'] !== 'returnrate') invalid(`${path}.name`, '"returnrate"', p['name']);
  str(p, 'version', path);
}

function settings(value: unknown, path: string): void {
  const s = object(value, path);
  num(s, 'maxN', path);
  if (s['unit'] !== 'nat' && s['unit'] !== 'bit') invalid(`${path}.unit`, '"nat" or "bit"', s['unit']);
  num(s, 'intervalSeconds', path, true);
  num(s, 'maxCensoredFraction', path);
  num(s, 'confidence', path);
}

const ROW_NUMBERS = ['n', 'positions', 'observed', 'censored', 'forwardObserved', 'blockEntropy', 'blockEntropyMillerMadow', 'conditionalEntropy', 'meanInformation', 'distinctBlocks', 'singletons', 'censoredFraction'];
const ROW_NULLABLE = ['forwardMeanLogReturn', 'meanLogReturn', 'varLogReturn', 'ratePerSymbol', 'meanLogRFreq', 'varLogRFreq', 'meanLogReturnCorrected', 'varLogReturnCorrected'];

function lengthRow(value: unknown, path: string): void {
  const r = object(value, path);
  for (const key of ROW_NUMBERS) num(r, key, path);
  for (const key of ROW_NULLABLE) num(r, key, path, true);
  numbersOrNull(r['quantilesLogReturn'], `${path}.quantilesLogReturn`);
}

function alternatives(value: unknown, path: string): void {
  const alts = object(value, path);
  for (const [key, alt] of Object.entries(alts)) {
    const p = `${path}.${key}`;
    const a = object(alt, p);
    num(a, 'estimate', p, true);
    pair(a['ci95'], `${p}.ci95`, true);
    str(a, 'label', p);
    str(a, 'note', p);
    num(a, 'standardError', p, true);
    pair(a['lengthsUsed'], `${p}.lengthsUsed`, true);
  }
}

function interval(o: Obj, path: string): void {
  num(o, 'estimate', path);
  pair(o['ci95'], `${path}.ci95`);
}

function entropy(value: unknown, path: string): void {
  const e = object(value, path);
  interval(e, path);
  for (const key of ['unit', 'method', 'reason']) str(e, key, path);
  pair(e['lengthsUsed'], `${path}.lengthsUsed`);
  if (e['perSecond'] !== null) interval(object(e['perSecond'], `${path}.perSecond`), `${path}.perSecond`);
  alternatives(e['alternatives'], `${path}.alternatives`);
  num(e, 'standardError', path, true);
  num(e, 'confidence', path);
  str(e, 'perSecondUnit', path, true);
}

function sigma2(value: unknown, path: string): void {
  const s = object(value, path);
  interval(s, path);
  for (const key of ['method', 'unit', 'reason']) str(s, key, path);
  bool(s, 'negligible', path);
  alternatives(s['alternatives'], `${path}.alternatives`);
  num(s, 'standardError', path, true);
}

function rowsOfNumbers(value: unknown, path: string, optional: boolean): void {
  if (optional && value === undefined) return;
  array(value, path).forEach((row, i) => numbersOrNull(row, `${path}[${i}]`));
}

function paths(value: unknown, path: string): void {
  const p = object(value, path);
  array(p['positions'], `${path}.positions`).forEach((v, i) => {
    if (typeof v !== 'number') invalid(`${path}.positions[${i}]`, 'a number', v);
  });
  rowsOfNumbers(p['logReturn'], `${path}.logReturn`, false);
  rowsOfNumbers(p['logCensoredBound'], `${path}.logCensoredBound`, true);
  rowsOfNumbers(p['logCount'], `${path}.logCount`, true);
}

function input(value: unknown, path: string): void {
  const i = object(value, path);
  str(i, 'name', path);
  num(i, 'symbols', path);
  num(i, 'alphabetSize', path);
  str(i, 'format', path);
  const sha = i['sha256'];
  if (sha !== null && (typeof sha !== 'string' || !SHA256_HEX.test(sha))) invalid(`${path}.sha256`, '64 lower-case hex digits or null', sha);
  if (i['alphabet'] !== undefined) array(i['alphabet'], `${path}.alphabet`);
  if (i['symbolization'] !== undefined) symbolization(i['symbolization'], `${path}.symbolization`);
}

/** The optional record of a real-valued input turned into symbols (the fields reports and captions print). */
function symbolization(value: unknown, path: string): void {
  const s = object(value, path);
  str(s, 'spec', path);
  numbersOrNull(s['cutPoints'], `${path}.cutPoints`);
  array(s['cells'], `${path}.cells`);
  for (const key of ['values', 'missing', 'segments']) num(s, key, path);
  if (s['missingPolicy'] !== 'skip' && s['missingPolicy'] !== 'split') invalid(`${path}.missingPolicy`, '"skip" or "split"', s['missingPolicy']);
}

function result(value: unknown, path: string): void {
  const r = object(value, path);
  if (r['schema'] !== ANALYSIS_SCHEMA) {
    const found = typeof r['schema'] === 'string' ? `"${r['schema']}"` : kindOf(r['schema']);
    throw new SessionError('schema-version', `the analysis inside this session has schema ${found}; this version reads ${ANALYSIS_SCHEMA}`, { field: `${path}.schema` });
  }
  program(r['program'], `${path}.program`);
  input(r['input'], `${path}.input`);
  settings(r['settings'], `${path}.settings`);
  array(r['lengths'], `${path}.lengths`).forEach((row, i) => lengthRow(row, `${path}.lengths[${i}]`));
  entropy(r['entropy'], `${path}.entropy`);
  sigma2(r['sigma2'], `${path}.sigma2`);
  if (r['exponentialLaw'] !== null) object(r['exponentialLaw'], `${path}.exponentialLaw`);
  paths(r['paths'], `${path}.paths`);
  if (r['reference'] !== null) object(r['reference'], `${path}.reference`);
  array(r['warnings'], `${path}.warnings`).forEach((w, i) => {
    const o = object(w, `${path}.warnings[${i}]`);
    str(o, 'code', `${path}.warnings[${i}]`);
    str(o, 'message', `${path}.warnings[${i}]`);
  });
  if (r['trustedRange'] !== null) {
    const t = object(r['trustedRange'], `${path}.trustedRange`);
    num(t, 'lo', `${path}.trustedRange`);
    num(t, 'hi', `${path}.trustedRange`);
    str(t, 'reason', `${path}.trustedRange`);
  }
  const scan = object(r['scan'], `${path}.scan`);
  for (const key of ['maxN', 'batchLength', 'batchCount', 'intervalBatches', 'matchWindow']) num(scan, key, `${path}.scan`);
  bool(scan, 'exhausted', `${path}.scan`);
  if (r['diagnostics'] !== undefined) diagnostics(r['diagnostics'], `${path}.diagnostics`);
}

/** Optional diagnostics: the parts the views draw are objects or null, and the reading has its words. */
function diagnostics(value: unknown, path: string): void {
  const d = object(value, path);
  for (const key of ['beta', 'autocorrelation', 'moments']) if (d[key] !== null) object(d[key], `${path}.${key}`);
  const reading = object(d['reading'], `${path}.reading`);
  str(reading, 'verdict', `${path}.reading`);
  str(reading, 'text', `${path}.reading`);
  str(reading, 'caveat', `${path}.reading`);
  if (d['beta'] !== null) {
    const b = d['beta'] as Obj;
    for (const key of ['gaps', 'beta', 'noiseFloor']) numbersOrNull(b[key], `${path}.beta.${key}`);
  }
  if (d['autocorrelation'] !== null) {
    const a = d['autocorrelation'] as Obj;
    for (const key of ['lags', 'acf']) numbersOrNull(a[key], `${path}.autocorrelation.${key}`);
    num(a, 'band', `${path}.autocorrelation`);
  }
}

function checkSchema(top: Obj): void {
  const schema = top['schema'];
  if (schema === SESSION_SCHEMA) return;
  const match = typeof schema === 'string' ? SESSION_SCHEMA_PATTERN.exec(schema) : null;
  if (match !== null) {
    const newer = Number(match[1]) > THIS_VERSION;
    throw new SessionError(
      'schema-version',
      `this session was saved by ${newer ? 'a newer' : 'an older'} returnrate (schema ${schema}); this version reads ${SESSION_SCHEMA}`,
      { field: 'schema' },
    );
  }
  if (schema === ANALYSIS_SCHEMA) {
    throw new SessionError('not-session', `this file is an analysis result (${ANALYSIS_SCHEMA}), not a session; save a session with "Save session"`, { field: 'schema' });
  }
  throw new SessionError('not-session', `this file is not a returnrate session: it has no "schema": "${SESSION_SCHEMA}" field`, { field: 'schema' });
}

/**
 * The session in `text`, checked field by field so that every view can draw it. Throws a
 * SessionError saying what is wrong: not JSON (with line and column), not a session, a session
 * schema this version does not read (older or newer), or the path of a missing or mistyped field.
 */
export function readSession(text: string): Session {
  const parsed = parse(text);
  if (typeof parsed !== 'object' || parsed === null || Array.isArray(parsed)) {
    throw new SessionError('not-session', `this file is not a returnrate session: it holds ${kindOf(parsed)}, not an object`);
  }
  const top = parsed as Obj;
  checkSchema(top);
  program(top['program'], 'program');
  str(top, 'savedAt', '');
  if (Number.isNaN(Date.parse(top['savedAt'] as string))) invalid('savedAt', 'a date and time (ISO 8601)', top['savedAt']);
  settings(top['settings'], 'settings');
  object(top['reading'], 'reading');
  object(top['view'], 'view');
  result(top['result'], 'result');
  if (top['calibration'] !== undefined) sessionCalibration(top['calibration'], 'calibration', top['result'] as AnalysisResult);
  if (top['comparison'] !== undefined) sessionComparison(top['comparison'], 'comparison');
  return parsed as Session;
}

/** Whether the first bytes of a file (as text) look like a returnrate session, whatever its version. */
export function looksLikeSession(head: string): boolean {
  return /"schema"\s*:\s*"returnrate\.session\//.test(head);
}
