/**
 * The section of one cell of the grid: area, surface width and the inverse, for the fixed walls
 * (w H, w) or the grid's valley section (physics/valleySection.ts). Every place that turns a
 * thickness into a volume or a surface width goes through here, so all use the same section.
 */
import type { FlowlineGrid } from './flowlineModel';
import { sectionArea, surfaceWidth, thicknessForArea } from './physics/valleySection';

type Grid = Pick<FlowlineGrid, 'widthAtCells' | 'section'>;

/** Section area of cell i at centre-line thickness H [m^2]. */
export function cellArea(grid: Grid, i: number, H: number): number {
  return grid.section ? sectionArea(grid.section, grid.widthAtCells[i], H) : grid.widthAtCells[i] * H;
}

/** Surface width of cell i at thickness H [m] (the floor width on bare ground). */
export function cellSurfaceWidth(grid: Grid, i: number, H: number): number {
  return grid.section ? surfaceWidth(grid.section, grid.widthAtCells[i], H) : grid.widthAtCells[i];
}

/** Thickness of cell i whose section has area A [m]. */
export function cellThicknessForArea(grid: Grid, i: number, A: number): number {
  return grid.section ? thicknessForArea(grid.section, grid.widthAtCells[i], A) : A / grid.widthAtCells[i];
}
