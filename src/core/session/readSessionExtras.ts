/**
 * Checks of a session's optional parts: the calibration of its result and the last two-sequence
 * comparison. Every field a view or the report draws is checked, and a problem names the field's
 * path, like the rest of readSession.
 */
import { CALIBRATION_SCHEMA } from '../calibration/calibrationResult';
import { COMPARISON_SCHEMA } from '../cross/comparisonResult';
import type { AnalysisResult } from '../result/analysisResult';
import { calibrationMismatch } from './calibrationBelongsTo';
import { SessionError } from './sessionError';

type Obj = Record<string, unknown>;

const SHA256_HEX = /^[0-9a-f]{64}$/;

const kindOf = (v: unknown): string => (v === null ? 'null' : Array.isArray(v) ? 'an array' : typeof v === 'object' ? 'an object' : `a ${typeof v}`);

function invalid(path: string, expected: string, value: unknown): never {
  throw new SessionError('invalid-field', `the session is damaged: ${path} should be ${expected} but is ${kindOf(value)}`, { field: path });
}

/** Field checks of one object at a path: each call checks o[key] and names `path.key` when it is wrong. */
class Fields {
  readonly o: Obj;
  constructor(
    value: unknown,
    readonly path: string,
  ) {
    if (typeof value !== 'object' || value === null || Array.isArray(value)) invalid(path, 'an object', value);
    this.o = value as Obj;
  }

  at(key: string): string {
    return `${this.path}.${key}`;
  }

  num(...keys: string[]): this {
    for (const key of keys) {
      const v = this.o[key];
      if (typeof v !== 'number' || !Number.isFinite(v)) invalid(this.at(key), 'a number', v);
    }
    return this;
  }

  numOrNull(...keys: string[]): this {
    for (const key of keys) {
      const v = this.o[key];
      if (v !== null && (typeof v !== 'number' || !Number.isFinite(v))) invalid(this.at(key), 'a number or null', v);
    }
    return this;
  }

  str(...keys: string[]): this {
    for (const key of keys) if (typeof this.o[key] !== 'string') invalid(this.at(key), 'a string', this.o[key]);
    return this;
  }

  bool(key: string): this {
    if (typeof this.o[key] !== 'boolean') invalid(this.at(key), 'true or false', this.o[key]);
    return this;
  }

  oneOf(key: string, allowed: readonly string[]): this {
    if (!allowed.includes(this.o[key] as string)) invalid(this.at(key), allowed.map((a) => `"${a}"`).join(' or '), this.o[key]);
    return this;
  }

  pair(key: string, nullable = false): this {
    const v = this.o[key];
    if (nullable && v === null) return this;
    if (!Array.isArray(v) || v.length !== 2 || !v.every((x) => typeof x === 'number' && Number.isFinite(x))) invalid(this.at(key), nullable ? 'a pair of numbers or null' : 'a pair of numbers', v);
    return this;
  }

  pairOrNull(...keys: string[]): this {
    for (const key of keys) this.pair(key, true);
    return this;
  }

  sha(key: string): this {
    const v = this.o[key];
    if (v !== null && (typeof v !== 'string' || !SHA256_HEX.test(v))) invalid(this.at(key), '64 lower-case hex digits or null', v);
    return this;
  }

  /** Each element of the array at key, checked by `each` with its path. */
  each(key: string, each: (value: unknown, path: string) => void): this {
    const v = this.o[key];
    if (!Array.isArray(v)) invalid(this.at(key), 'an array', v);
    (v as unknown[]).forEach((x, i) => each(x, `${this.at(key)}[${i}]`));
    return this;
  }

  /** The object at key, or nothing when it is null and null is allowed. */
  child(key: string, check: (f: Fields) => void, nullable = false): this {
    if (nullable && this.o[key] === null) return this;
    check(new Fields(this.o[key], this.at(key)));
    return this;
  }
}

const finiteNumber = (v: unknown, path: string): void => {
  if (typeof v !== 'number' || !Number.isFinite(v)) invalid(path, 'a number', v);
};
const string = (v: unknown, path: string): void => {
  if (typeof v !== 'string') invalid(path, 'a string', v);
};

function settings(f: Fields): void {
  f.num('maxN', 'maxCensoredFraction', 'confidence').numOrNull('intervalSeconds').oneOf('unit', ['nat', 'bit']);
}

function schema(f: Fields, expected: string): void {
  if (f.o['schema'] !== expected) invalid(f.at('schema'), `"${expected}"`, f.o['schema']);
}

function estimatorCalibration(f: Fields): void {
  f.num('exact', 'replicates', 'intervals', 'covered').numOrNull('mean', 'bias', 'biasStandardError', 'spread', 'coverage', 'coverageStandardError');
}

/**
 * The session's calibration: a CalibrationResult whose input and settings are those of the
 * session's result (a calibration of other data would print numbers that do not belong there).
 */
export function sessionCalibration(value: unknown, path: string, result: AnalysisResult): void {
  const c = new Fields(value, path);
  schema(c, CALIBRATION_SCHEMA);
  c.child('input', (i) => i.str('name').sha('sha256').num('symbols'));
  c.child('settings', settings);
  c.num('baseSeed', 'replicatesRequested').bool('partial');
  c.child('model', (m) => {
    m.num('order', 'maxOrder', 'observations', 'states', 'transientStates', 'droppedTransitions', 'period', 'entropyRate', 'sigma2');
    m.str('capReason', 'rule').oneOf('criterion', ['BIC']);
    m.each('scores', (s, p) => new Fields(s, p).num('order', 'logLikelihood', 'parameters', 'bic'));
  });
  c.each('records', (r, p) =>
    new Fields(r, p).num('replicate', 'seed').numOrNull('entropy', 'sigma2').pairOrNull('entropyInterval', 'sigma2Interval').str('entropyMethod'),
  );
  c.child('summary', (s) => {
    s.num('replicates').child('entropy', estimatorCalibration).child('sigma2', estimatorCalibration);
    s.child('methods', (m) => {
      for (const key of Object.keys(m.o)) m.num(key);
    });
    s.child('correctedEntropy', (e) => e.num('estimate').pair('interval').str('label'), true);
  });
  const mismatch = calibrationMismatch(value as Parameters<typeof calibrationMismatch>[0], result);
  if (mismatch !== null) {
    throw new SessionError('invalid-field', `the session is damaged: ${path}.${mismatch} differs from result.${mismatch}, so the calibration does not belong to the session's result`, {
      field: `${path}.${mismatch}`,
    });
  }
}

function rateEstimate(f: Fields): void {
  f.numOrNull('estimate', 'standardError').pairOrNull('ci95', 'lengthsUsed').str('note');
}

function comparisonInput(f: Fields): void {
  f.str('name', 'format').num('symbols', 'alphabetSize').sha('sha256');
}

/** The session's last two-sequence comparison (a ComparisonResult). */
export function sessionComparison(value: unknown, path: string): void {
  const c = new Fields(value, path);
  schema(c, COMPARISON_SCHEMA);
  c.child('program', (p) => p.oneOf('name', ['returnrate']).str('version'));
  c.child('inputA', comparisonInput).child('inputB', comparisonInput).child('settings', settings);
  c.child('alphabet', (a) => a.num('size').each('missingInB', string).each('missingInA', string));
  c.num('pairs', 'confidence').str('unit');
  c.each('lengths', (r, p) =>
    new Fields(r, p).num('n', 'positions', 'observed', 'censored', 'censoredFraction').numOrNull('meanLogWait', 'varLogWait', 'ratePerSymbol'),
  );
  c.child('crossEntropy', rateEstimate).child('relativeEntropy', rateEstimate);
  c.child('entropyA', (e) => {
    rateEstimate(e);
    e.str('method');
  });
  c.child('sigma2Cross', (s) => s.numOrNull('estimate').str('note'));
  c.child('exact', (e) => e.str('source').num('crossEntropy', 'entropyA', 'relativeEntropy').numOrNull('sigma2Cross'), true);
  c.child(
    'fluctuations',
    (q) => q.num('n', 'centreRateNats', 'sigmaNats', 'censored').oneOf('basis', ['exact', 'estimate']).each('positions', finiteNumber).each('values', finiteNumber),
    true,
  );
  c.child('trustedRange', (t) => t.num('lo', 'hi').str('reason'), true);
  c.each('warnings', (w, p) => new Fields(w, p).str('code', 'message'));
}
