import type { Session } from './session';

/** Order of the top-level fields: the schema first, so a reader can tell a session from its head. */
const TOP_ORDER: readonly (keyof Session)[] = ['schema', 'program', 'savedAt', 'settings', 'reading', 'view', 'result', 'calibration', 'comparison'];

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * The session as JSON text with 2-space indent and a stable key order: the top level in TOP_ORDER,
 * every nested object with its keys sorted, so the same session always gives the same bytes
 * whichever way its objects were built (a result read back from storage keeps the order it was
 * written in, a fresh one the order the core builds it in). JSON.stringify escapes quotes, control
 * characters and lone surrogates in names, so any symbol or file name survives the round trip.
 */
export function writeSession(session: Session): string {
  const top: Record<string, unknown> = {};
  for (const key of TOP_ORDER) if (session[key] !== undefined) top[key] = session[key];
  const sorted = function (this: unknown, _key: string, value: unknown): unknown {
    if (value === top || !isPlainObject(value)) return value;
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(value).sort()) out[k] = value[k];
    return out;
  };
  return `${JSON.stringify(top, sorted, 2)}\n`;
}
