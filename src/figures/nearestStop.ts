import type { ReadoutStop } from './figureModel';

/** Index of the read-out stop nearest to pixel x (stops sorted by x); -1 when there are none. */
export function nearestStop(stops: readonly ReadoutStop[], x: number): number {
  let best = -1;
  let distance = Infinity;
  for (let i = 0; i < stops.length; i++) {
    const d = Math.abs((stops[i] as ReadoutStop).x - x);
    if (d < distance) {
      distance = d;
      best = i;
    }
  }
  return best;
}

/** Index after a key press in the read-out (arrows step, Home/End jump, PageUp/PageDown step by 5); null for other keys. */
export function stepStop(key: string, current: number, count: number): number | null {
  if (count === 0) return null;
  const from = current < 0 ? 0 : current;
  const clamp = (i: number): number => Math.max(0, Math.min(count - 1, i));
  switch (key) {
    case 'ArrowRight':
    case 'ArrowUp':
      return current < 0 ? 0 : clamp(from + 1);
    case 'ArrowLeft':
    case 'ArrowDown':
      return current < 0 ? 0 : clamp(from - 1);
    case 'PageUp':
      return clamp(from + 5);
    case 'PageDown':
      return clamp(from - 5);
    case 'Home':
      return 0;
    case 'End':
      return count - 1;
    default:
      return null;
  }
}
