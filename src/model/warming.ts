/**
 * Warming dT(t) [K] against model years: piecewise linear through the scenario's [year, K]
 * points and constant beyond the ends; no points means no warming.
 */
import { piecewiseLinear, type Point } from './piecewiseLinear';

export function warmingSeries(points: readonly Point[] | undefined): (year: number) => number {
  if (!points || points.length === 0) return () => 0;
  return piecewiseLinear(points);
}
