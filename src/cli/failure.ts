import { UsageError } from './usageError';

/**
 * One line for a failure the user can act on. Errors of the user's making (bad input, bad options)
 * never print a stack trace; an unexpected fault prints its message and asks for RETURNRATE_DEBUG=1
 * to see the trace.
 */
export function describeFailure(error: unknown): { line: string; exitCode: number } {
  if (error instanceof UsageError) return { line: `${error.message} (see returnrate --help)`, exitCode: 2 };
  if (error instanceof Error) {
    const known = error.name === 'ReadError' || error instanceof RangeError || error.name === 'ScanCancelled';
    const line = known ? error.message : `unexpected failure: ${error.message}`;
    return { line, exitCode: 1 };
  }
  return { line: `unexpected failure: ${String(error)}`, exitCode: 1 };
}
