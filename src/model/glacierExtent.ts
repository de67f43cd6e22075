/**
 * Where the glacier is: cells with at least MIN_GLACIER_THICKNESS of ice. The terminus is the
 * down-valley face of the last such cell; the length runs from the up-valley face of the first.
 */
import { cellArea } from './cellSection';
import type { FlowlineGrid } from './flowlineModel';

/** Thickness from which a cell counts as glacier for length, area and AAR [m]. */
export const MIN_GLACIER_THICKNESS = 1;

export interface GlacierExtent {
  /** Index of the first and last glacier cell; -1 when there is none. */
  firstCell: number;
  lastCell: number;
  /** Down-valley end of the ice [m]; NaN when there is no glacier. */
  terminus: number;
  /** Terminus minus the up-valley end of the ice [m]; 0 when there is no glacier. */
  length: number;
}

export function glacierExtent(grid: FlowlineGrid, thickness: Float64Array): GlacierExtent {
  let firstCell = -1;
  let lastCell = -1;
  for (let i = 0; i < grid.cellCount; i++) {
    if (thickness[i] >= MIN_GLACIER_THICKNESS) {
      if (firstCell < 0) firstCell = i;
      lastCell = i;
    }
  }
  if (lastCell < 0) return { firstCell, lastCell, terminus: Number.NaN, length: 0 };
  const terminus = (lastCell + 1) * grid.spacing;
  return { firstCell, lastCell, terminus, length: terminus - firstCell * grid.spacing };
}

/**
 * Ice volume [m^3] (per metre of width for a unit-width flowline): sum of w H dx over all cells,
 * or of the section area A(H) dx with a valley section.
 */
export function iceVolume(grid: FlowlineGrid, thickness: Float64Array): number {
  let volume = 0;
  if (grid.section) for (let i = 0; i < grid.cellCount; i++) volume += cellArea(grid, i, thickness[i]);
  else for (let i = 0; i < grid.cellCount; i++) volume += grid.widthAtCells[i] * thickness[i];
  return volume * grid.spacing;
}
