import { UsageError } from './usageError';

/** Errors of the user's making besides UsageError: printed as their message alone. */
const KNOWN_ERRORS = new Set(['ReadError', 'OutputError', 'ScanCancelled']);

/**
 * One line for a failure the user can act on. Errors of the user's making (bad input, bad options)
 * never print a stack trace; an unexpected fault prints its message and asks for RETURNRATE_DEBUG=1
 * to see the trace.
 * @param file the input file of the command, named in front of a reading or analysis failure whose
 *   message does not name it already (when many files run through a script, the line says which)
 */
export function describeFailure(error: unknown, file?: string): { line: string; exitCode: number } {
  if (error instanceof UsageError) return { line: `${error.message} (see returnrate --help)`, exitCode: 2 };
  if (error instanceof Error) {
    const known = KNOWN_ERRORS.has(error.name) || error instanceof RangeError;
    const line = known ? error.message : `unexpected failure: ${error.message}`;
    const named = file === undefined || line.startsWith(`${file}:`) || error.name === 'OutputError' ? line : `${file}: ${line}`;
    return { line: named, exitCode: 1 };
  }
  return { line: `unexpected failure: ${String(error)}`, exitCode: 1 };
}
