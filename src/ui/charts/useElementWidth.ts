import { useLayoutEffect, useRef, useState } from 'react';

/**
 * The content width of an element, kept current with a ResizeObserver (figures redraw to fit). The
 * observer reports the first width itself, after the browser's own layout; reading clientWidth here
 * would force a layout of the whole page inside the commit that mounts the figure, once per figure
 * (about 25 ms at the end of a run, `npm run bench`, browser part).
 */
export function useElementWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const element = ref.current;
    if (element === null) return;
    if (typeof ResizeObserver === 'undefined') {
      setWidth(Math.round(element.clientWidth) || fallback);
      return;
    }
    const observer = new ResizeObserver((entries) => {
      const box = entries[entries.length - 1]?.contentRect;
      if (box !== undefined) setWidth(Math.round(box.width) || fallback);
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, [fallback]);
  return { ref, width };
}

/** Figure height for a width: half as tall as wide, kept between sizes that stay readable on small and large screens. */
export function figureHeight(width: number): number {
  return Math.round(Math.min(520, Math.max(300, width * 0.5)));
}
