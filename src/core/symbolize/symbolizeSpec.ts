/** How a real-valued series becomes symbols; see parseSymbolizeSpec for the text forms. */
export type SymbolizeSpec =
  | { readonly kind: 'quantile'; readonly cells: number }
  | { readonly kind: 'threshold'; readonly cuts: readonly number[] }
  | { readonly kind: 'ordinal'; readonly order: number; readonly delay: number };

/** The text forms, for help texts. */
export const SYMBOLIZE_SPEC_FORMS: readonly string[] = ['quantile:K', 'threshold:T1,T2,...', 'ordinal:D[:TAU]'];

/** Most quantile cells; more would leave too few values per cell to mean anything. */
export const MAX_QUANTILE_CELLS = 1024;
/** Largest ordinal order: 8! = 40 320 patterns already need very long series. */
export const MAX_ORDINAL_ORDER = 8;

const INTEGER = /^\d+$/;
const DECIMAL = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** @param range what the number must be besides whole, e.g. 'from 2 to 1024', so one message says all */
function wholeNumber(text: string, what: string, range: string, spec: string): number {
  const t = text.trim();
  if (!INTEGER.test(t)) throw new RangeError(`symbolization '${spec}': ${what} must be a whole number ${range}, got '${text}'`);
  return Number(t);
}

/**
 * Parses `quantile:K` (K >= 2 cells of equal empirical mass), `threshold:T1,T2,...` (strictly
 * increasing finite cut points) or `ordinal:D[:TAU]` (Bandt & Pompe ordinal patterns of order
 * 2 <= D <= 8, delay TAU >= 1, default 1).
 * @throws RangeError naming the bad part
 */
export function parseSymbolizeSpec(text: string): SymbolizeSpec {
  const spec = text.trim();
  const colon = spec.indexOf(':');
  const kind = (colon < 0 ? spec : spec.slice(0, colon)).trim().toLowerCase();
  const rest = colon < 0 ? '' : spec.slice(colon + 1);
  switch (kind) {
    case 'quantile': {
      if (rest.trim() === '') throw new RangeError(`symbolization '${spec}': give the number of cells, e.g. quantile:4`);
      const cells = wholeNumber(rest, 'the number of cells K', `from 2 to ${MAX_QUANTILE_CELLS}`, spec);
      if (cells < 2 || cells > MAX_QUANTILE_CELLS) throw new RangeError(`symbolization '${spec}': K must be between 2 and ${MAX_QUANTILE_CELLS}, got ${cells}`);
      return { kind, cells };
    }
    case 'threshold': {
      if (rest.trim() === '') throw new RangeError(`symbolization '${spec}': give at least one cut point, e.g. threshold:0.5 or threshold:-1,1`);
      const cuts = rest.split(',').map((part) => {
        const t = part.trim();
        if (!DECIMAL.test(t) || !Number.isFinite(Number(t))) throw new RangeError(`symbolization '${spec}': cut point '${part}' is not a finite decimal number`);
        return Number(t);
      });
      for (let i = 1; i < cuts.length; i++) {
        if (!(cuts[i] > cuts[i - 1])) throw new RangeError(`symbolization '${spec}': cut points must increase strictly, but ${cuts[i]} follows ${cuts[i - 1]}`);
      }
      return { kind, cuts };
    }
    case 'ordinal': {
      const parts = rest.split(':');
      if (rest.trim() === '' || parts.length > 2) throw new RangeError(`symbolization '${spec}': write ordinal:D or ordinal:D:TAU, e.g. ordinal:3`);
      const order = wholeNumber(parts[0], 'the order D', `from 2 to ${MAX_ORDINAL_ORDER}`, spec);
      if (order < 2 || order > MAX_ORDINAL_ORDER) throw new RangeError(`symbolization '${spec}': the order D must be between 2 and ${MAX_ORDINAL_ORDER}, got ${order}`);
      const delay = parts.length === 2 ? wholeNumber(parts[1], 'the delay TAU', 'of at least 1', spec) : 1;
      if (delay < 1) throw new RangeError(`symbolization '${spec}': the delay TAU must be at least 1, got ${delay}`);
      return { kind, order, delay };
    }
    default:
      throw new RangeError(`unknown symbolization '${spec}'; expected ${SYMBOLIZE_SPEC_FORMS.join(', ')}`);
  }
}

/** The canonical text of a spec (what parseSymbolizeSpec reads back to the same spec). */
export function formatSymbolizeSpec(spec: SymbolizeSpec): string {
  switch (spec.kind) {
    case 'quantile':
      return `quantile:${spec.cells}`;
    case 'threshold':
      return `threshold:${spec.cuts.map(String).join(',')}`;
    case 'ordinal':
      return `ordinal:${spec.order}:${spec.delay}`;
  }
}
