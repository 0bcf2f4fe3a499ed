import { describe, expect, it } from 'vitest';
import { linearAxis } from '../../src/figures/linearAxis';
import { plotArea } from '../../src/figures/plotArea';
import { nearestStop, stepStop } from '../../src/figures/nearestStop';
import { markerPath } from '../../src/figures/markerPath';

describe('linearAxis', () => {
  it('rounds the domain outward to nice values and labels the ticks, with a true minus sign', () => {
    const { axis } = linearAxis([-0.37, 2.9], [300, 0], { label: 'y', unit: 'nat' });
    expect(axis.domain).toEqual([-0.5, 3]);
    expect(axis.ticks.map((t) => t.label)).toEqual(['−0.5', '0.0', '0.5', '1.0', '1.5', '2.0', '2.5', '3.0']);
    expect(axis.ticks[0]?.position).toBe(300);
    expect(axis.ticks[axis.ticks.length - 1]?.position).toBe(0);
  });

  it('keeps whole-number ticks only on an integer axis and widens a one-value domain', () => {
    expect(linearAxis([1, 3], [0, 400], { label: 'n', unit: '', integer: true }, false).axis.ticks.map((t) => t.label)).toEqual(['1', '2', '3']);
    expect(linearAxis([2, 2], [100, 0], { label: 'y', unit: '' }).axis.domain).toEqual([1, 3]);
    expect(() => linearAxis([0, Number.NaN], [0, 1], { label: 'y', unit: '' })).toThrow(RangeError);
  });
});

describe('plotArea', () => {
  it('leaves the margins for ticks and titles and refuses tiny figures', () => {
    expect(plotArea({ width: 400, height: 300 })).toEqual({ left: 70, top: 14, width: 312, height: 236 });
    expect(() => plotArea({ width: 100, height: 300 })).toThrow('a figure needs at least 240 x 180 pixels; got 100 x 300');
  });
});

describe('read-out stops', () => {
  const stops = [10, 20, 30].map((x, i) => ({ n: i + 1, x, rows: [] }));
  it('nearestStop picks the stop closest to the pointer', () => {
    expect(nearestStop(stops, 24)).toBe(1);
    expect(nearestStop(stops, -50)).toBe(0);
    expect(nearestStop([], 5)).toBe(-1);
  });
  it('stepStop moves with the arrows, jumps with Home and End, and stays inside', () => {
    expect(stepStop('ArrowRight', -1, 3)).toBe(0);
    expect(stepStop('ArrowRight', 2, 3)).toBe(2);
    expect(stepStop('ArrowLeft', 1, 3)).toBe(0);
    expect(stepStop('End', 0, 3)).toBe(2);
    expect(stepStop('Home', 2, 3)).toBe(0);
    expect(stepStop('x', 1, 3)).toBeNull();
  });
});

describe('markerPath', () => {
  it('draws each shape as a closed path centred on the point', () => {
    expect(markerPath('square', 10, 10, 4)).toBe('M8,8h4v4h-4Z');
    expect(markerPath('circle', 0, 0, 2)).toBe('M-1,0a1,1 0 1,0 2,0a1,1 0 1,0 -2,0Z');
  });
});
