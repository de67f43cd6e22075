/**
 * Lakes in the overdeepenings the ice has left, at one output frame. Computed on the main thread
 * (one pass over the cells, well under a millisecond for thousands of cells) and memoised per
 * frame, so the long profile and the numbers share one computation and playback redoes none.
 */
import { exposedLakes, type ExposedLake } from '../../model/analysis/exposedLakes';
import type { FlowlineGrid } from '../../model/flowlineModel';
import type { RunFrame } from '../../state/runStore';
import type { RunGrid } from '../../worker/protocol';

const byFrame = new WeakMap<RunFrame, ExposedLake[]>();
const grids = new WeakMap<RunGrid, FlowlineGrid>();

/** The run's grid as exposedLakes reads it (cell centres, bed, widths, spacing). */
function flowlineGrid(grid: RunGrid): FlowlineGrid {
  let known = grids.get(grid);
  if (!known) {
    const n = grid.x.length;
    const widthAtFaces = new Float64Array(n + 1);
    for (let j = 0; j <= n; j++) widthAtFaces[j] = 0.5 * (grid.width[Math.max(0, j - 1)] + grid.width[Math.min(n - 1, j)]);
    known = { cellCount: n, spacing: grid.length / n, x: grid.x, bed: grid.bed, bedBeyondEnd: grid.bed[n - 1], widthAtCells: grid.width, widthAtFaces };
    grids.set(grid, known);
  }
  return known;
}

export function frameLakes(frame: RunFrame, grid: RunGrid): ExposedLake[] {
  let lakes = byFrame.get(frame);
  if (!lakes) {
    lakes = exposedLakes(flowlineGrid(grid), frame.fields.thickness);
    byFrame.set(frame, lakes);
  }
  return lakes;
}
