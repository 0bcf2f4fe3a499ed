/** Why a reader refused its input; the code is stable, the message is for people. */
export type ReadErrorCode =
  | 'empty'
  | 'too-short'
  | 'invalid-utf8'
  | 'binary-in-text'
  | 'missing-column'
  | 'bad-number'
  | 'unterminated-quote'
  | 'bad-fasta'
  | 'too-many-symbols'
  | 'bad-option'
  | 'bad-csv'
  | 'short-row'
  /** a file of this program (a session, a result, a part file) given where a sequence belongs */
  | 'not-a-sequence'
  | 'missing-file'
  | 'unreadable-file';

/** Where in the input a problem sits; lines and columns are 1-based, bytes 0-based. */
export interface InputPosition {
  readonly line?: number;
  readonly column?: number;
  readonly byte?: number;
}

/**
 * An input the user gave cannot be read. The message names the place (line, column or byte) and
 * what was expected, so hosts print it as one line without a stack trace.
 */
export class ReadError extends Error {
  override readonly name = 'ReadError';
  constructor(
    readonly code: ReadErrorCode,
    message: string,
    readonly position: InputPosition = {},
  ) {
    super(withPosition(message, position));
  }
}

function withPosition(message: string, p: InputPosition): string {
  const parts: string[] = [];
  if (p.line !== undefined) parts.push(`line ${p.line}`);
  if (p.column !== undefined) parts.push(`column ${p.column}`);
  if (p.byte !== undefined) parts.push(`byte ${p.byte}`);
  return parts.length > 0 ? `${parts.join(', ')}: ${message}` : message;
}
