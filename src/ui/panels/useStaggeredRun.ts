import { useMemo } from 'react';
import { useStaggeredValue } from '../charts/useStaggeredValue';
import { useAppState } from '../store/store';

/** The last result and the running run's rows, taken together (so the final result never shows
 * beside an older view of the rows) and staggered like useStaggeredValue: a panel that draws them
 * takes a new run's end in its own task. */
export function useStaggeredRun() {
  const result = useAppState((s) => s.result);
  const partial = useAppState((s) => s.partial);
  return useStaggeredValue(useMemo(() => ({ result, partial }), [result, partial]));
}
