import { describe, expect, it } from 'vitest';
import { bandPath, minMaxBand } from '../../src/chart/spreadBand';

describe('spread band', () => {
  it('is the lowest and highest value at each time over members with the same output times', () => {
    const band = minMaxBand([
      { times: [0, 10, 20], values: [5, 4, 3] },
      { times: [0, 10, 20], values: [5, 6, NaN] },
      { times: [0, 10, 20], values: [5, 2, 1] },
      { times: [0, 5], values: [100, 100] },
    ]);
    expect(band).toEqual({ times: [0, 10, 20], low: [5, 2, 1], high: [5, 6, 3] });
    expect(bandPath(band!, (t) => t, (v) => v)).toBe('M0.0,5.0L10.0,6.0L20.0,3.0L20.0,1.0L10.0,2.0L0.0,5.0Z');
    expect(minMaxBand([{ times: [0], values: [1] }])).toBeNull();
  });
});
