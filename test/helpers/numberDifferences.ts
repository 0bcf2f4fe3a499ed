/**
 * Paths where two JSON-like values differ under Object.is, walking the first one's keys, so -0
 * against 0, a lost digit or a null turned number all show; lists every difference.
 */
export function numberDifferences(a: unknown, b: unknown, path = ''): string[] {
  if (typeof a === 'object' && a !== null) {
    if (typeof b !== 'object' || b === null) return [path];
    return Object.keys(a).flatMap((k) => numberDifferences((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], `${path}.${k}`));
  }
  return Object.is(a, b) ? [] : [`${path}: ${String(a)} vs ${String(b)}`];
}
