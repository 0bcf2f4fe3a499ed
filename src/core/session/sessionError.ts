/** Why a session file could not be opened. */
export type SessionErrorCode = 'not-json' | 'not-session' | 'schema-version' | 'invalid-field';

/** A session file that cannot be opened, with a message for the user and, for bad JSON, where. */
export class SessionError extends Error {
  override readonly name = 'SessionError';
  readonly code: SessionErrorCode;
  /** 1-based line and column of a JSON syntax error, when the engine told its position. */
  readonly line: number | null;
  readonly column: number | null;
  /** Dotted path of the field at fault (code 'invalid-field'), e.g. 'result.lengths[2].n'. */
  readonly field: string | null;

  constructor(code: SessionErrorCode, message: string, where: { line?: number; column?: number; field?: string } = {}) {
    super(message);
    this.code = code;
    this.line = where.line ?? null;
    this.column = where.column ?? null;
    this.field = where.field ?? null;
  }
}
