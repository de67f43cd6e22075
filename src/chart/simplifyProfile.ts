/**
 * Ramer–Douglas–Peucker simplification (Ramer 1972; Douglas & Peucker 1973) of a profile z(x).
 * The distance from the chord is measured vertically, in metres of elevation: a profile is a
 * function of x, and with the large vertical exaggeration of a long profile the vertical misfit
 * is what a reader sees. The first and last points are always kept.
 */
import type { Point } from '../model/scenario';

export function simplifyProfile(points: readonly Point[], toleranceM: number): Point[] {
  if (points.length <= 2) return points.map((p) => [p[0], p[1]] as Point);
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  // Explicit stack: a recursive version could overflow on a long freehand stroke.
  const stack: [number, number][] = [[0, points.length - 1]];
  while (stack.length) {
    const [first, last] = stack.pop()!;
    const [x0, z0] = points[first];
    const [x1, z1] = points[last];
    let worst = -1;
    let worstIndex = -1;
    for (let i = first + 1; i < last; i++) {
      const [x, z] = points[i];
      const t = x1 === x0 ? 0 : (x - x0) / (x1 - x0);
      const misfit = Math.abs(z - (z0 + t * (z1 - z0)));
      if (misfit > worst) {
        worst = misfit;
        worstIndex = i;
      }
    }
    if (worstIndex > 0 && worst > toleranceM) {
      keep[worstIndex] = 1;
      stack.push([first, worstIndex], [worstIndex, last]);
    }
  }
  const out: Point[] = [];
  keep.forEach((k, i) => {
    if (k) out.push([points[i][0], points[i][1]]);
  });
  return out;
}
