/** Snapping to a grid of `dx` metres along the valley and `dz` metres of elevation. */
import type { Point } from '../../../model/scenario';

export interface SnapGrid {
  dx: number;
  dz: number;
}

/** Default grid: 50 m along the valley, 10 m in elevation (finer than a survey's usual spacing). */
export const DEFAULT_SNAP: SnapGrid = { dx: 50, dz: 10 };

export function snapPoint([x, z]: Point, grid: SnapGrid): Point {
  return [Math.round(x / grid.dx) * grid.dx, Math.round(z / grid.dz) * grid.dz];
}
