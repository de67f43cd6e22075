/**
 * A freehand stroke (in metres, as the pointer moved) turned into a profile point list: clipped to
 * the domain [0, length], x strictly increasing (backtracking parts of the stroke are skipped, as
 * a profile has one elevation per x), then simplified to `toleranceM` metres of elevation.
 */
import type { Point } from '../../../model/scenario';
import { simplifyProfile } from '../../../chart/simplifyProfile';

/** Smallest horizontal distance between two kept stroke samples [m]. */
export const MIN_POINT_GAP_M = 1;

export function strokeToProfile(stroke: readonly Point[], lengthM: number, toleranceM: number): Point[] {
  const monotone: Point[] = [];
  for (const [xRaw, z] of stroke) {
    if (!Number.isFinite(xRaw) || !Number.isFinite(z)) continue;
    const x = Math.min(lengthM, Math.max(0, xRaw));
    const last = monotone[monotone.length - 1];
    if (!last || x >= last[0] + MIN_POINT_GAP_M) monotone.push([x, z]);
  }
  return simplifyProfile(monotone, toleranceM);
}
