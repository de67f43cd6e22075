import { describe, expect, it } from 'vitest';
import { indexRuns, linePath } from '../../src/chart/linePath';

describe('linePath', () => {
  const double = (v: number) => 2 * v;
  it('draws straight from typed arrays, breaking the line where samples are left out or not finite', () => {
    const xs = Float64Array.from([0, 1, 2, 3, 4]);
    const ys = Float64Array.from([5, 6, NaN, 8, 9]);
    expect(linePath(xs, ys, double, double)).toBe('M0.0,10.0L2.0,12.0M6.0,16.0L8.0,18.0');
    expect(linePath(xs, ys, double, double, (i) => i !== 1)).toBe('M0.0,10.0M6.0,16.0L8.0,18.0');
    expect(linePath(xs, ys, double, double, () => false)).toBe('');
  });
});

describe('indexRuns', () => {
  it('finds the runs where a test holds, including at both ends', () => {
    const on = [1, 1, 0, 1, 0, 0, 1];
    expect(indexRuns(on.length, (i) => on[i] === 1)).toEqual([
      [0, 1],
      [3, 3],
      [6, 6],
    ]);
    expect(indexRuns(0, () => true)).toEqual([]);
  });
});

describe('linePath thinned to the screen', () => {
  it('breaks where the full line breaks and thins a straight run to its ends', () => {
    const xs = Float64Array.from({ length: 9 }, (_, i) => i);
    const ys = Float64Array.from([0, 1, 2, 3, NaN, 5, 6, 7, 8]);
    const same = (v: number) => v;
    expect(linePath(xs, ys, same, same, undefined, true)).toBe('M0.0,0.0L3.0,3.0M5.0,5.0L8.0,8.0');
    expect(linePath(xs, ys, same, same, (i) => i !== 6, true)).toBe('M0.0,0.0L3.0,3.0M5.0,5.0M7.0,7.0L8.0,8.0');
  });
});
