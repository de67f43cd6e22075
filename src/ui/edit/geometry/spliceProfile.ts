/**
 * Puts a newly drawn piece of profile into an existing point list: the existing points before and
 * after the piece are kept, those under it are replaced. So a stroke over part of the valley
 * redraws that part only.
 */
import type { Point } from '../../../model/scenario';
import { MIN_POINT_GAP_M } from './strokeToProfile';

export function spliceProfile(existing: readonly Point[], piece: readonly Point[]): Point[] {
  if (piece.length === 0) return existing.map((p) => [p[0], p[1]]);
  const start = piece[0][0];
  const end = piece[piece.length - 1][0];
  return [
    ...existing.filter(([x]) => x < start - MIN_POINT_GAP_M),
    ...piece,
    ...existing.filter(([x]) => x > end + MIN_POINT_GAP_M),
  ].map((p) => [p[0], p[1]] as Point);
}
