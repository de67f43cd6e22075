import { describe, expect, it } from 'vitest';
import { linearAxis } from '../../src/chart/axisTicks';

describe('linearAxis', () => {
  it('rounds the domain out to nice values and maps it onto the pixel range', () => {
    const axis = linearAxis(0, 87.3, [200, 0], 4);
    expect(axis.domain).toEqual([0, 100]);
    expect(axis.px(0)).toBe(200);
    expect(axis.px(100)).toBe(0);
    expect(axis.px(25)).toBe(150);
    expect(axis.ticks.map((t) => t.label)).toEqual(['0', '20', '40', '60', '80', '100']);
    expect(axis.ticks[1].px).toBeCloseTo(160, 12);
  });

  it('labels negative values with a true minus sign', () => {
    expect(linearAxis(-1, 1, [0, 100], 2).ticks.map((t) => t.label)).toEqual(['\u22121', '0', '1']);
  });

  it('gives a flat or undefined series an axis one unit wide instead of dividing by zero', () => {
    expect(linearAxis(5, 5, [0, 100], 4).domain).toEqual([5, 6]);
    expect(linearAxis(Number.NaN, Number.NaN, [0, 100], 4).domain).toEqual([0, 1]);
  });

  it('returns the same axis for the same request, so playback does not rebuild it', () => {
    expect(linearAxis(0, 300, [60, 370], 5)).toBe(linearAxis(0, 300, [60, 370], 5));
  });
});
