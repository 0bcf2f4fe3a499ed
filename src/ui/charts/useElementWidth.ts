import { useLayoutEffect, useRef, useState } from 'react';

/** The content width of an element, kept current with a ResizeObserver (figures redraw to fit). */
export function useElementWidth<T extends HTMLElement>(fallback = 720) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(fallback);
  useLayoutEffect(() => {
    const element = ref.current;
    if (element === null) return;
    const measure = () => setWidth(Math.round(element.clientWidth) || fallback);
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(element);
    return () => observer.disconnect();
  }, [fallback]);
  return { ref, width };
}

/** Figure height for a width: half as tall as wide, kept between sizes that stay readable on small and large screens. */
export function figureHeight(width: number): number {
  return Math.round(Math.min(520, Math.max(300, width * 0.5)));
}
