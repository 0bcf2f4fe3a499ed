import { useEffect, useState } from 'react';

/** How often the elapsed time (and the time left) is redrawn while work goes on. */
const CLOCK_MS = 500;

/** Clock time, ticking while `running` so the elapsed time moves between progress reports. */
export function useClock(running: boolean): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!running) return;
    const timer = window.setInterval(() => setNow(Date.now()), CLOCK_MS);
    return () => window.clearInterval(timer);
  }, [running]);
  return now;
}
