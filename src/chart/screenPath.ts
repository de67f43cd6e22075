/**
 * Path data for lines drawn on screen from many samples. A flowline of 1,600 cells spans fewer
 * pixels than it has cells, and the browser's style, layout, paint and raster work grows with
 * the points in every path, so drawing each sample costs frames for nothing the eye can see.
 * A line is thinned with Ramer–Douglas–Peucker (Ramer 1972; Douglas & Peucker 1973), keeping it
 * within SCREEN_TOLERANCE of the full line, measured vertically in SVG user units. The plots are
 * drawn in about one user unit per pixel, so the thinned line is the same line to the eye. Files
 * and exported figures are written from the full data, never from these paths.
 */
import type { Point } from '../model/piecewiseLinear';
import { simplifyProfile } from './simplifyProfile';

/** Largest vertical distance between a thinned line and the full one [SVG user units]. */
export const SCREEN_TOLERANCE = 0.2;

/** The points of a line left-to-right (increasing x) that are needed to draw it on screen. */
export function screenPoints(points: readonly Point[]): Point[] {
  return simplifyProfile(points, SCREEN_TOLERANCE);
}

/** "M x,y L x,y …" to 0.1 user unit, closed with Z when asked; '' for no points. */
export function pathData(points: readonly Point[], close = false): string {
  let d = '';
  for (let i = 0; i < points.length; i++) d += `${i ? 'L' : 'M'}${points[i][0].toFixed(1)},${points[i][1].toFixed(1)}`;
  return close && d ? `${d}Z` : d;
}
