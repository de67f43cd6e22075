import { describe, expect, it } from 'vitest';
import { pathData, SCREEN_TOLERANCE, screenPoints } from '../../src/chart/screenPath';

/** Vertical distance from (x, y) to the polyline through `line` (x increasing). */
function misfit(line: readonly (readonly [number, number])[], x: number, y: number): number {
  for (let k = 1; k < line.length; k++) {
    const [x0, y0] = line[k - 1];
    const [x1, y1] = line[k];
    if (x >= x0 && x <= x1) return Math.abs(y - (x1 === x0 ? y0 : y0 + ((x - x0) / (x1 - x0)) * (y1 - y0)));
  }
  return Infinity;
}

describe('screenPoints', () => {
  // A glacier-like surface over 1,600 cells squeezed into 754 user units: a parabola (the
  // plastic profile's shape, Nye 1952) ending in a near-vertical snout, then bare bed.
  const cells = 1600;
  const full: [number, number][] = [];
  for (let i = 0; i < cells; i++) {
    const x = 86 + (i + 0.5) * (754 / cells);
    const s = i < 1200 ? 400 - 250 * Math.sqrt(1 - i / 1200) : 400 + (i - 1200) * 0.05;
    full.push([x, s]);
  }

  it('keeps every sample within the tolerance of the thinned line, and the ends exactly', () => {
    const thin = screenPoints(full);
    expect(thin[0]).toEqual(full[0]);
    expect(thin[thin.length - 1]).toEqual(full[full.length - 1]);
    const worst = Math.max(...full.map(([x, y]) => misfit(thin, x, y)));
    expect(worst).toBeLessThanOrEqual(SCREEN_TOLERANCE + 1e-12);
  });

  it('needs far fewer points than cells for a smooth surface (the reason it exists)', () => {
    expect(screenPoints(full).length).toBeLessThan(cells / 4);
  });

  it('keeps a step the size of a pixel', () => {
    const step: [number, number][] = Array.from({ length: 100 }, (_, i) => [i, i < 50 ? 10 : 11]);
    const thin = screenPoints(step);
    expect(thin).toContainEqual([49, 10]);
    expect(thin).toContainEqual([50, 11]);
  });
});

describe('pathData', () => {
  it('writes move-to, line-to and an optional close to 0.1 unit', () => {
    expect(pathData([[0, 10], [2.04, 12.06], [6, 16]])).toBe('M0.0,10.0L2.0,12.1L6.0,16.0');
    expect(pathData([[0, 1], [1, 0]], true)).toBe('M0.0,1.0L1.0,0.0Z');
    expect(pathData([], true)).toBe('');
  });
});
