/**
 * Smallest and largest value of a piecewise-linear curve (constant beyond its ends) on [a, b]:
 * the extremes lie at the interval ends or at points inside it.
 */
import { piecewiseLinear, type Point } from '../model/piecewiseLinear';

export interface ValueRange {
  min: number;
  max: number;
}

export function curveRange(points: readonly Point[], a: number, b: number): ValueRange {
  const f = piecewiseLinear(points);
  let min = Math.min(f(a), f(b));
  let max = Math.max(f(a), f(b));
  for (const [x, y] of points) {
    if (x > a && x < b) {
      min = Math.min(min, y);
      max = Math.max(max, y);
    }
  }
  return { min, max };
}
