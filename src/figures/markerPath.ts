import type { MarkerShape } from './figureModel';

/** SVG path data of a marker of about `size` pixels across, centred on (x, y); shapes differ so colour is not needed to tell series apart. */
export function markerPath(shape: MarkerShape, x: number, y: number, size = 7): string {
  const r = size / 2;
  const f = (v: number): string => String(Math.round(v * 100) / 100);
  switch (shape) {
    case 'circle':
      return `M${f(x - r)},${f(y)}a${f(r)},${f(r)} 0 1,0 ${f(2 * r)},0a${f(r)},${f(r)} 0 1,0 ${f(-2 * r)},0Z`;
    case 'square':
      return `M${f(x - r)},${f(y - r)}h${f(2 * r)}v${f(2 * r)}h${f(-2 * r)}Z`;
    case 'triangle':
      return `M${f(x)},${f(y - r * 1.15)}L${f(x + r * 1.15)},${f(y + r)}L${f(x - r * 1.15)},${f(y + r)}Z`;
    case 'diamond':
      return `M${f(x)},${f(y - r * 1.3)}L${f(x + r)},${f(y)}L${f(x)},${f(y + r * 1.3)}L${f(x - r)},${f(y)}Z`;
  }
}
