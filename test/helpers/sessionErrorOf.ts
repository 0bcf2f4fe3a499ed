import { readSession } from '../../src/core/session/readSession';
import { SessionError } from '../../src/core/session/sessionError';

/** The SessionError readSession throws for `text`; fails the test when it accepts the text or throws anything else. */
export function sessionErrorOf(text: string): SessionError {
  try {
    readSession(text);
  } catch (error) {
    if (error instanceof SessionError) return error;
    throw error;
  }
  throw new Error('readSession accepted the text');
}
