/**
 * Frontal ablation (calving) into a proglacial lake at the ice front.
 *
 * Water-depth relation: the calving rate is proportional to the water depth at the front,
 *     u_c = c * D_w                                       [m a^-1]
 * (Brown, Meier & Post 1982, USGS Professional Paper 1258-C, for tidewater glaciers:
 * c about 27 a^-1; freshwater-terminating glaciers calve about an order of magnitude slower,
 * c about 2-3 a^-1: Funk & Röthlisberger 1989, Ann. Glaciol. 13; Warren & Kirkbride 2003,
 * Ann. Glaciol. 36. All these coefficients are quoted from memory; check the papers before
 * relying on them.) The calving flux is u_c * H_front * w_front [m^3 a^-1].
 *
 * D_w comes from the lakes of analysis/exposedLakes.ts (same fill levels, same ice threshold
 * and minimum depth): when the first ice-free cell down-valley of the terminus cell holds water
 * (an exposed lake that touches the ice front), D_w = water level - bed there; otherwise 0 (no
 * lake, or the glacier reaches the end of the domain). The terminus cell is the down-valley-most
 * cell with at least MIN_GLACIER_THICKNESS of ice, as in glacierExtent.
 *
 * Splitting (Lie/Godunov, first order): after each stepper step of length dt the calving
 * sub-problem dV_front/dt = -u_c H_front w_front is solved exactly with D_w, H_front and w_front
 * of the terminus cell held while the front crosses that cell: the front moves up-valley at u_c,
 * so the cell loses the fraction u_c dt / dx of its ice; a cell emptied before the step's end
 * (after dx / u_c) hands the remaining time to the new front cell, with its own D_w. Never more
 * than the ice a cell holds is removed, so thickness stays non-negative; the volume removed is
 * returned for the mass budget.
 */
import type { FlowlineGrid } from '../flowlineModel';
import { fillLevels } from '../analysis/exposedLakes';
import { cellArea, cellThicknessForArea } from '../cellSection';
import { MIN_GLACIER_THICKNESS } from '../glacierExtent';

/** Water shallower than this is dry [m] (the default minDepth of exposedLakes). */
const LAKE_MIN_DEPTH = 0.01;

type Grid = Pick<FlowlineGrid, 'cellCount' | 'spacing' | 'bed' | 'widthAtCells' | 'section'>;

export interface IceFront {
  /** Index of the terminus cell (last cell with at least MIN_GLACIER_THICKNESS of ice); -1: no glacier. */
  cell: number;
  /** Water depth at the first ice-free cell beyond it [m]; 0 without a lake there. */
  waterDepth: number;
}

/** The terminus cell and the depth of a lake touching the front. `levels`: fillLevels(grid.bed). */
export function iceFront(grid: Grid, thickness: ArrayLike<number>, levels: ArrayLike<number> = fillLevels(grid.bed)): IceFront {
  let cell = -1;
  for (let i = grid.cellCount - 1; i >= 0; i--) {
    if (thickness[i] >= MIN_GLACIER_THICKNESS) {
      cell = i;
      break;
    }
  }
  const k = cell + 1;
  if (cell < 0 || k >= grid.cellCount) return { cell, waterDepth: 0 };
  const depth = levels[k] - grid.bed[k];
  return { cell, waterDepth: depth > LAKE_MIN_DEPTH ? depth : 0 };
}

/**
 * Calving flux u_c H w [m^3 a^-1] at the current front (u_c A(H) in a valley section); 0 without
 * a lake at the front.
 */
export function frontalAblationFlux(grid: Grid, thickness: ArrayLike<number>, coefficient: number, levels?: ArrayLike<number>): number {
  const front = iceFront(grid, thickness, levels);
  if (front.cell < 0) return 0;
  if (grid.section) return coefficient * front.waterDepth * cellArea(grid, front.cell, thickness[front.cell]);
  return coefficient * front.waterDepth * thickness[front.cell] * grid.widthAtCells[front.cell];
}

/**
 * Applies frontal ablation over `dt` years in place (the exact split step above); returns the
 * ice volume removed [m^3]. `removedByCell` (optional) accumulates the volume per cell.
 */
export function applyFrontalAblation(
  grid: Grid,
  thickness: Float64Array,
  coefficient: number,
  dt: number,
  levels: ArrayLike<number>,
  removedByCell?: Float64Array,
): number {
  if (!(coefficient > 0) || !(dt > 0)) return 0;
  const dx = grid.spacing;
  let remaining = dt;
  let removed = 0;
  while (remaining > 0) {
    const front = iceFront(grid, thickness, levels);
    const speed = coefficient * front.waterDepth;
    if (front.cell < 0 || !(speed > 0)) break;
    const i = front.cell;
    const timeToEmpty = dx / speed;
    const fraction = timeToEmpty >= remaining ? (speed * remaining) / dx : 1;
    let volume: number;
    if (grid.section) {
      // The front cell loses that fraction of its section area; the thickness follows the area.
      const area = cellArea(grid, i, thickness[i]);
      const next = fraction === 1 ? 0 : cellThicknessForArea(grid, i, area - fraction * area);
      volume = (area - cellArea(grid, i, next)) * dx;
      thickness[i] = next;
    } else {
      volume = fraction * thickness[i] * grid.widthAtCells[i] * dx;
      thickness[i] = fraction === 1 ? 0 : thickness[i] - fraction * thickness[i];
    }
    removed += volume;
    if (removedByCell) removedByCell[i] += volume;
    remaining = fraction === 1 ? remaining - timeToEmpty : 0;
  }
  return removed;
}
