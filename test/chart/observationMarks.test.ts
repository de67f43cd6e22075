import { describe, expect, it } from 'vitest';
import { errorBarMarks, impliedBed, terminusObservation, valueRange, withinRange } from '../../src/chart/observationMarks';

describe('observation marks', () => {
  it('draws thickness as the bed it implies under the surface shown, with the bar at +- the uncertainty', () => {
    // Surface 2000 m at x = 50, 1900 m at x = 150: at x = 100 it is 1950 m; 300 m of ice
    // observed there implies a bed at 1650 m, +- 20 m.
    const marks = impliedBed([[100, 300, 20], [900, 10, 1]], [50, 150], [2000, 1900], 200);
    expect(marks).toEqual([{ x: 100, value: 1650, sigma: 20, index: 0 }]);
  });

  it('maps points and bars to pixels, clipping bars to the plot area', () => {
    const xPixel = (x: number) => x / 10; // 10 m per pixel
    const yPixel = (z: number) => 500 - z / 10; // up is smaller
    const [a, b] = errorBarMarks(
      [
        { x: 100, value: 1650, sigma: 20, index: 0 },
        { x: 200, value: 4990, sigma: 30, index: 3 },
      ],
      xPixel,
      yPixel,
      0,
      400,
    );
    expect(a).toMatchObject({ index: 0, cx: 10, cy: 335, y1: 333, y2: 337, clipped: false });
    // 5020 m would be at -2 px: clipped to the top edge.
    expect(b).toMatchObject({ index: 3, cx: 20, cy: 1, y1: 0, y2: 4, clipped: true });
  });

  it('keeps points inside the range, gives the range the bars need, and splits the terminus', () => {
    expect(withinRange([[10, 5, 1], [-1, 5, 1], [11, 5, 1]], 10)).toEqual([{ x: 10, value: 5, sigma: 1, index: 0 }]);
    expect(valueRange([{ x: 0, value: 5, sigma: 1, index: 0 }, { x: 1, value: 9, sigma: 2, index: 1 }])).toEqual([4, 11]);
    expect(valueRange([])).toBeNull();
    expect(terminusObservation(8200)).toEqual({ position: 8200, record: [] });
    expect(terminusObservation([[0, 8200], [20, 8000]])).toEqual({ position: null, record: [[0, 8200], [20, 8000]] });
    expect(terminusObservation(undefined)).toEqual({ position: null, record: [] });
  });
});
