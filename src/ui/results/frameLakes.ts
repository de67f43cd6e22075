/**
 * Lakes in the overdeepenings the ice has left, at one output frame. Computed on the main thread
 * (one pass over the cells, well under a millisecond for thousands of cells) the way exported
 * figures compute them (figures/lakesMarkup.ts lakesAt), and memoised per frame, so the long
 * profile and the numbers share one computation and playback redoes none.
 */
import type { ExposedLake } from '../../model/analysis/exposedLakes';
import { lakesAt } from '../../figures/lakesMarkup';
import type { RunFrame } from '../../state/runStore';
import type { RunGrid } from '../../worker/protocol';

const byFrame = new WeakMap<RunFrame, ExposedLake[]>();

export function frameLakes(frame: RunFrame, grid: RunGrid): ExposedLake[] {
  let lakes = byFrame.get(frame);
  if (!lakes) {
    lakes = lakesAt(grid, frame);
    byFrame.set(frame, lakes);
  }
  return lakes;
}
