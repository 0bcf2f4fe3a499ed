import { useEffect, useState } from 'react';
import { flushSync } from 'react-dom';

// Figures waiting to take a new value, one per task: a finished run changes every figure at once,
// and drawing them all in one commit held the main thread past 100 ms (`npm run bench`, browser
// part); one figure per task keeps each task short and lets input events in between.
const waiting: (() => void)[] = [];
let pumping = false;

function pump(): void {
  const next = waiting.shift();
  if (next === undefined) {
    pumping = false;
    return;
  }
  next();
  setTimeout(pump, 0);
}

/**
 * `value` as it was when this component's turn in the page-wide queue came: the first value at
 * once, later ones one component per task, in the order they changed, each committed on its own.
 */
export function useStaggeredValue<T>(value: T): T {
  // Wrapped, so a function value is kept rather than called as an initializer.
  const [shown, setShown] = useState(() => value);
  useEffect(() => {
    if (Object.is(shown, value)) return;
    let live = true;
    waiting.push(() => {
      if (live) flushSync(() => setShown(() => value));
    });
    if (!pumping) {
      pumping = true;
      setTimeout(pump, 0);
    }
    return () => {
      live = false;
    };
  }, [value, shown]);
  return shown;
}

