/**
 * Sample percentiles by linear interpolation between closest ranks: for n values sorted
 * x_0 <= ... <= x_(n-1), h = (n - 1) p / 100 and Q = x_floor(h) + (h - floor h)(x_(floor h + 1) -
 * x_floor(h)). Definition 7 of Hyndman & Fan (1996, "Sample quantiles in statistical packages",
 * The American Statistician 50(4), 361-365), the default of R and NumPy. One value gives that
 * value at every p; no value gives NaN. +Infinity stands for "not within the run": a percentile
 * on it, or interpolated towards it, is +Infinity.
 */

/** The percentiles an ensemble reports: 5, 17, 50, 83, 95 (the 17-83 range is about +-1 sd of a normal). */
export const ENSEMBLE_PERCENTILES = [5, 17, 50, 83, 95] as const;

export function percentileOfSorted(sorted: ArrayLike<number>, p: number): number {
  const n = sorted.length;
  if (n === 0) return Number.NaN;
  const h = ((n - 1) * p) / 100;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  const a = sorted[lo];
  const b = sorted[hi];
  if (a === b) return a; // also Infinity === Infinity
  if (b === Number.POSITIVE_INFINITY) return h === lo ? a : Number.POSITIVE_INFINITY;
  return a + (h - lo) * (b - a);
}

/** Percentiles of the values (NaN left out), in the order of `ps`. */
export function percentiles(values: ArrayLike<number>, ps: readonly number[] = ENSEMBLE_PERCENTILES): number[] {
  const sorted = Array.from(values).filter((v) => !Number.isNaN(v)).sort((x, y) => x - y);
  return ps.map((p) => percentileOfSorted(sorted, p));
}
