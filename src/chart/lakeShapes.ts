/**
 * Lakes in exposed overdeepenings (model/analysis/exposedLakes.ts) as plain drawing geometry for
 * the long profile: a water polygon between the water level and the bed line as the profile
 * draws it (straight between cell centres), and a label with the greatest depth and the volume.
 * No React and no DOM, so it is unit-tested on hand-worked cases.
 */
import type { ExposedLake } from '../model/analysis/exposedLakes';
import type { PixelPoint } from './longProfile';

export interface LakeShape {
  /** Closed outline: the water surface from up-valley to down-valley, then the bed back. */
  polygon: PixelPoint[];
  /** The water surface alone. */
  surface: [PixelPoint, PixelPoint];
  /** Label lines and the point they are centred on (above the water surface). */
  label: [string, string];
  labelAt: PixelPoint;
}

/** Where the bed line between cell centres a and b (one wet, one dry) crosses the level [m]. */
function crossing(x: ArrayLike<number>, bed: ArrayLike<number>, a: number, b: number, level: number): number {
  const t = (level - bed[a]) / (bed[b] - bed[a]);
  return x[a] + Math.min(1, Math.max(0, t)) * (x[b] - x[a]);
}

/** Lake volume for a label: 10⁶ m³ to two significant figures, or per metre of width for a unit-width flowline. */
export function formatLakeVolume(m3: number, unitWidth: boolean): string {
  const value = unitWidth ? m3 / 1e3 : m3 / 1e6;
  const text = value >= 100 ? value.toFixed(0) : Number(value.toPrecision(2)).toString();
  return unitWidth ? `≈ ${text} × 10³ m³ per m of width` : `≈ ${text} × 10⁶ m³`;
}

/** The one heading for lakes on screen, in figures and in the report. */
export const LAKES_HEADING = 'Lakes in exposed overdeepenings';

export function lakeLabel(lake: ExposedLake, unitWidth: boolean): [string, string] {
  return [`Lake, up to ${Math.round(lake.maxDepth)} m deep`, formatLakeVolume(lake.volume, unitWidth)];
}

/**
 * Shapes of `lakes` on a profile sampled at cell centres `x` [m] with bed `bed` [m a.s.l.].
 * A lake spans the cells whose centres lie between its start and end; at each end the water
 * meets the bed line where that line rises through the water level, or stops at the lake's edge
 * where the depression runs on under the ice.
 */
export function lakeShapes(
  lakes: readonly ExposedLake[],
  x: ArrayLike<number>,
  bed: ArrayLike<number>,
  xPixel: (metres: number) => number,
  zPixel: (elevation: number) => number,
  unitWidth: boolean,
): LakeShape[] {
  const n = x.length;
  return lakes.flatMap((lake, k) => {
    const cells: number[] = [];
    for (let i = 0; i < n; i++) if (x[i] > lake.start && x[i] < lake.end) cells.push(i);
    if (cells.length === 0) return [];
    const first = cells[0];
    const last = cells[cells.length - 1];
    const level = lake.waterLevel;
    const left = first > 0 && bed[first - 1] >= level ? crossing(x, bed, first, first - 1, level) : lake.start;
    const right = last < n - 1 && bed[last + 1] >= level ? crossing(x, bed, last, last + 1, level) : lake.end;
    const y = zPixel(level);
    const floor: PixelPoint[] = cells.map((i): PixelPoint => [xPixel(x[i]), zPixel(bed[i])]).reverse();
    const surface: [PixelPoint, PixelPoint] = [
      [xPixel(left), y],
      [xPixel(right), y],
    ];
    // Neighbouring lakes' labels are staggered so they never sit on one line.
    const labelAt: PixelPoint = [(surface[0][0] + surface[1][0]) / 2, y - 14 - (k % 2) * 40];
    return [{ polygon: [...surface, ...floor], surface, label: lakeLabel(lake, unitWidth), labelAt }];
  });
}
