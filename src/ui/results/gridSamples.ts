/**
 * A run's cell centres and bed as the long profile takes them (plain arrays), made once per grid:
 * the spin-up preview and every output frame hand the profile the same arrays, so it redraws the
 * bed only when the grid changes.
 */
import type { RunGrid } from '../../worker/protocol';

const byGrid = new WeakMap<RunGrid, { x: number[]; bed: number[] }>();

export function gridSamples(grid: RunGrid): { x: number[]; bed: number[] } {
  let samples = byGrid.get(grid);
  if (!samples) {
    samples = { x: Array.from(grid.x), bed: Array.from(grid.bed) };
    byGrid.set(grid, samples);
  }
  return samples;
}
