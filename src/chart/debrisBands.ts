/**
 * The debris cover (scenario key `debris`) as bands along the ice surface of a long profile: one
 * polyline per run of ice-covered cells under debris, widened to the cells' edges, with the
 * thickest debris in the run for the tooltip and legend. Pure: the screen and the figures draw it.
 */
import { piecewiseLinear, type Point } from '../model/piecewiseLinear';
import type { PixelPoint } from './longProfile';
import { indexRuns } from './linePath';

export interface DebrisBand {
  /** The ice surface under the band [px], down-valley. */
  line: PixelPoint[];
  /** Thickest debris in the band [m]. */
  maxThickness: number;
  /** Where the band starts and ends [m down-valley]. */
  fromX: number;
  toX: number;
}

export function debrisBands(
  debris: readonly Point[] | undefined,
  samples: { x: ArrayLike<number>; surface: ArrayLike<number>; thickness: ArrayLike<number> },
  xPixel: (x: number) => number,
  zPixel: (z: number) => number,
): DebrisBand[] {
  if (!debris || debris.length === 0) return [];
  const thicknessAt = piecewiseLinear(debris);
  const { x, surface, thickness } = samples;
  const half = x.length > 1 ? (x[1] - x[0]) / 2 : 0;
  return indexRuns(x.length, (i) => thickness[i] > 0 && thicknessAt(x[i]) > 0).map(([a, b]) => {
    const line: PixelPoint[] = [[xPixel(x[a] - half), zPixel(surface[a])]];
    let maxThickness = 0;
    for (let i = a; i <= b; i++) {
      line.push([xPixel(x[i]), zPixel(surface[i])]);
      maxThickness = Math.max(maxThickness, thicknessAt(x[i]));
    }
    line.push([xPixel(x[b] + half), zPixel(surface[b])]);
    return { line, maxThickness, fromX: x[a] - half, toX: x[b] + half };
  });
}

/** "Debris cover, up to 0.4 m thick, 6.2–9.0 km". */
export function debrisBandLabel(band: DebrisBand): string {
  return `Debris cover, up to ${Number(band.maxThickness.toPrecision(2))} m thick, ${(band.fromX / 1000).toFixed(1)}–${(band.toX / 1000).toFixed(1)} km`;
}
