/**
 * Piecewise-linear interpolation through [x, y] points with x strictly increasing,
 * held constant beyond the first and last point. This is how the scenario format
 * defines bed, width, surface, warming and balance tables.
 */
export type Point = readonly [number, number];

export function piecewiseLinear(points: readonly Point[]): (x: number) => number {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const last = points.length - 1;
  return (x: number): number => {
    if (x <= xs[0]) return ys[0];
    if (x >= xs[last]) return ys[last];
    // Binary search for the segment containing x.
    let lo = 0;
    let hi = last;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid;
    }
    const t = (x - xs[lo]) / (xs[hi] - xs[lo]);
    return ys[lo] + t * (ys[hi] - ys[lo]);
  };
}
