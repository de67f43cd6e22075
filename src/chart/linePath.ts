import type { Point } from '../model/piecewiseLinear';
import { pathData, screenPoints } from './screenPath';

/**
 * SVG path data from typed arrays, one string. Samples left out by `include` or not finite break
 * the line. `thinToScreen`: for lines of one sample per cell (x increasing), keep only the points
 * needed on screen (screenPath.ts); never for files or exported figures.
 */
export function linePath(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  xPixel: (x: number) => number,
  yPixel: (y: number) => number,
  include: (i: number) => boolean = () => true,
  thinToScreen = false,
): string {
  let d = '';
  for (const [first, last] of indexRuns(xs.length, (i) => include(i) && Number.isFinite(ys[i]))) {
    const run: Point[] = [];
    for (let i = first; i <= last; i++) run.push([xPixel(xs[i]), yPixel(ys[i])]);
    d += pathData(thinToScreen ? screenPoints(run) : run);
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
