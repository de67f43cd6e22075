import type { Point } from '../../model/piecewiseLinear';
import { pathData, screenPoints } from './screenPath';

/**
 * SVG path data straight from typed arrays: one string, no intermediate point objects, so a
 * frame's lines cost little on the main thread. Samples left out by `include` break the line.
 */
export function linePath(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  xPixel: (x: number) => number,
  yPixel: (y: number) => number,
  include: (i: number) => boolean = () => true,
): string {
  let d = '';
  let pen = false;
  for (let i = 0; i < xs.length; i++) {
    if (!include(i) || !Number.isFinite(ys[i])) {
      pen = false;
      continue;
    }
    d += `${pen ? 'L' : 'M'}${xPixel(xs[i]).toFixed(1)},${yPixel(ys[i]).toFixed(1)}`;
    pen = true;
  }
  return d;
}

/**
 * As linePath, for lines of one sample per cell (x increasing), thinned to what the screen can
 * show (screenPath.ts).
 */
export function screenLinePath(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  xPixel: (x: number) => number,
  yPixel: (y: number) => number,
  include: (i: number) => boolean = () => true,
): string {
  const drawn = (i: number) => include(i) && Number.isFinite(ys[i]);
  let d = '';
  for (const [first, last] of indexRuns(xs.length, drawn)) {
    const run: Point[] = [];
    for (let i = first; i <= last; i++) run.push([xPixel(xs[i]), yPixel(ys[i])]);
    d += pathData(screenPoints(run));
  }
  return d;
}

/** Index ranges [first, last] where `test` holds, in order. */
export function indexRuns(length: number, test: (i: number) => boolean): [number, number][] {
  const runs: [number, number][] = [];
  let first = -1;
  for (let i = 0; i <= length; i++) {
    const inside = i < length && test(i);
    if (inside && first < 0) first = i;
    if (!inside && first >= 0) {
      runs.push([first, i - 1]);
      first = -1;
    }
  }
  return runs;
}
