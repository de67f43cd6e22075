/**
 * Lakes that could form in overdeepenings the ice has uncovered.
 *
 * Method (depression filling on a 1-D profile): water at cell i can stand no higher than the
 * highest bed between i and either end of the domain, and it drains over the lower of those two
 * spill points, so its level is
 *     W_i = min( max_{j <= i} z_j , max_{j >= i} z_j ),      depth d_i = W_i - z_i >= 0
 * (the one-dimensional case of the priority-flood idea of Planchon & Darboux 2002, Catena 46,
 * and Barnes, Lehman & Mulla 2014, Computers & Geosciences 62). Both ends of the domain are open:
 * beyond the last cell the valley drains, so a bed that falls all the way to the down-valley end
 * holds no water; the extreme cells act as lips. Nested depressions fill to the level of the
 * lowest lip that contains them all, as water would.
 *
 * A lake is a run of neighbouring cells that are ice-free (thinner than `iceThreshold`) and have
 * d_i > minDepth. Its volume is sum A_i(d_i) dx over those cells, A_i(d) the area of the cell's
 * section filled to depth d above the floor (cellSection.cellArea: d w_i for fixed walls; in a
 * valley section the water fills the flanks too, e.g. w0 d + k d^2 / 2 in a trapezoid). Where the depression continues
 * under the ice the lake is in contact with the ice (reported), and only the exposed part counts.
 * This is geometry only: no water budget, no ice dam, no sediment infill, no breach.
 */
import { cellArea } from '../cellSection';
import type { FlowlineGrid } from '../flowlineModel';
import { MIN_GLACIER_THICKNESS } from '../glacierExtent';

export interface ExposedLake {
  /** Up-valley and down-valley edges of the exposed lake cells [m]. */
  start: number;
  end: number;
  /** end - start [m] */
  length: number;
  /** Water level, the height of the lip that holds it [m a.s.l.]. */
  waterLevel: number;
  /** Largest depth [m] and where [m]. */
  maxDepth: number;
  deepestAt: number;
  /** Water volume in the valley's section [m^3] (per metre of width for a unit-width flowline). */
  volume: number;
  /** The depression continues under the ice at one of its ends. */
  touchesIce: boolean;
}

export interface LakeOptions {
  /** Cells with at least this much ice are glacier [m]; default: the glacier threshold, 1 m. */
  iceThreshold?: number;
  /** Depths at or below this are dry [m]; default 0.01 m (round-off and flat beds). */
  minDepth?: number;
}

/** Fill level of every cell: min of the running maxima from the head and from the end. */
export function fillLevels(bed: ArrayLike<number>): Float64Array {
  const n = bed.length;
  const fromEnd = new Float64Array(n);
  let highest = Number.NEGATIVE_INFINITY;
  for (let i = n - 1; i >= 0; i--) fromEnd[i] = highest = Math.max(highest, bed[i]);
  const level = new Float64Array(n);
  highest = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < n; i++) {
    highest = Math.max(highest, bed[i]);
    level[i] = Math.min(highest, fromEnd[i]);
  }
  return level;
}

export function exposedLakes(
  grid: Pick<FlowlineGrid, 'cellCount' | 'spacing' | 'x' | 'bed' | 'widthAtCells' | 'section'>,
  thickness: ArrayLike<number>,
  options: LakeOptions = {},
): ExposedLake[] {
  const iceThreshold = options.iceThreshold ?? MIN_GLACIER_THICKNESS;
  const minDepth = options.minDepth ?? 0.01;
  const level = fillLevels(grid.bed);
  const n = grid.cellCount;
  const dx = grid.spacing;
  const wet = (i: number) => level[i] - grid.bed[i] > minDepth;
  const lakes: ExposedLake[] = [];
  let i = 0;
  while (i < n) {
    if (!(wet(i) && thickness[i] < iceThreshold)) {
      i++;
      continue;
    }
    const first = i;
    let maxDepth = 0;
    let deepestAt = grid.x[i];
    let volume = 0;
    // One lake: neighbouring exposed wet cells at the same level (a lip at that level splits it).
    while (i < n && wet(i) && thickness[i] < iceThreshold && level[i] === level[first]) {
      const depth = level[i] - grid.bed[i];
      if (depth > maxDepth) {
        maxDepth = depth;
        deepestAt = grid.x[i];
      }
      // Fixed walls: widthAtCells[i] * depth, the same double as depth * width (multiplication commutes).
      volume += cellArea(grid, i, depth) * dx;
      i++;
    }
    const last = i - 1;
    const iceAt = (k: number) => k >= 0 && k < n && wet(k) && level[k] === level[first] && thickness[k] >= iceThreshold;
    lakes.push({
      start: first * dx,
      end: (last + 1) * dx,
      length: (last + 1 - first) * dx,
      waterLevel: level[first],
      maxDepth,
      deepestAt,
      volume,
      touchesIce: iceAt(first - 1) || iceAt(last + 1),
    });
  }
  return lakes;
}

/** Lakes at each output time of a run. */
export function exposedLakesOverTime(
  grid: FlowlineGrid,
  frames: readonly { time: number; fields: { thickness: ArrayLike<number> } }[],
  options?: LakeOptions,
): { time: number; lakes: ExposedLake[] }[] {
  return frames.map((frame) => ({ time: frame.time, lakes: exposedLakes(grid, frame.fields.thickness, options) }));
}
