/**
 * Moves one point of a point list, keeping x strictly increasing: x stays at least
 * MIN_POINT_GAP_M from its neighbours; an end point may move within [lower, upper] (normally the
 * domain) but is never pulled back into it if it already lay outside.
 */
import type { Point } from '../../../model/scenario';
import { MIN_POINT_GAP_M } from './strokeToProfile';

export function movePoint(
  points: readonly Point[],
  index: number,
  target: Point,
  bounds: { lower: number; upper: number },
): Point[] {
  const current = points[index];
  const lower = index > 0 ? points[index - 1][0] + MIN_POINT_GAP_M : Math.min(bounds.lower, current[0]);
  const upper = index < points.length - 1 ? points[index + 1][0] - MIN_POINT_GAP_M : Math.max(bounds.upper, current[0]);
  const x = Math.min(upper, Math.max(lower, target[0]));
  return points.map((p, i) => (i === index ? [x, target[1]] : [p[0], p[1]]));
}
