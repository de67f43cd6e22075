/**
 * Inserts a point on the line at x (its y interpolated, so the profile does not change until the
 * point is moved). Returns the new list and the new point's index, or null where a point already
 * lies within MIN_POINT_GAP_M of x.
 */
import { piecewiseLinear } from '../../../model/piecewiseLinear';
import type { Point } from '../../../model/scenario';
import { MIN_POINT_GAP_M } from './strokeToProfile';

export function insertPoint(points: readonly Point[], x: number): { points: Point[]; index: number } | null {
  if (points.some(([px]) => Math.abs(px - x) < MIN_POINT_GAP_M)) return null;
  const y = piecewiseLinear(points)(x);
  const index = points.filter(([px]) => px < x).length;
  const next: Point[] = points.map((p) => [p[0], p[1]]);
  next.splice(index, 0, [x, y]);
  return { points: next, index };
}

/** x halfway between point `index` and the next one (or, for the last point, the previous one). */
export function midpointAfter(points: readonly Point[], index: number): number {
  const neighbour = index < points.length - 1 ? index + 1 : index - 1;
  return (points[index][0] + points[neighbour][0]) / 2;
}
