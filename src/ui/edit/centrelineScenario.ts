/**
 * The scenario with an imported centreline's surface. The line's head is x = 0 and its distances
 * are geodesic (csvImport/geojsonCentreline.ts); its elevations become the initial ice surface.
 * The bed, width and everything else are kept: a surface alone says nothing of the bed, which the
 * bed inversion is to provide.
 *
 * The domain is kept unless the user asks for it to end at the line's end (rounded up to whole
 * cells of the current spacing, so the spacing is kept). A line longer than the domain is warned
 * about: its lower part would lie outside the model. Where the line ends inside the domain, the
 * surface follows the bed from 1 m past the line's end (the bed there, then the bed's own points),
 * so the rest of the valley starts ice-free: a scenario's surface is otherwise held at its last
 * elevation beyond its last point, which would put ice all the way down the valley.
 */
import type { CentrelinePoint } from '../../csvImport/geojsonCentreline';
import type { Point, Scenario } from '../../model/scenario';
import { piecewiseLinear } from '../../model/piecewiseLinear';

export interface ImportedCentreline {
  scenario: Scenario;
  /** The line is longer than the domain that results (its end is outside the model). */
  longerThanDomain: boolean;
  /** The domain length that would reach the line's end [m], whole cells of the current spacing. */
  domainToLineEnd: number;
  notes: string[];
}

const km = (m: number): string => `${Number((m / 1000).toFixed(3))} km`;

export function centrelineScenario(s: Scenario, points: readonly CentrelinePoint[], options: { domainToLine: boolean }): ImportedCentreline {
  const lengthM = points.length ? points[points.length - 1].distanceM : 0;
  const spacing = s.grid.spacing;
  const domainToLineEnd = Math.max(2, Math.ceil(lengthM / spacing - 1e-9)) * spacing;
  const domain = options.domainToLine ? domainToLineEnd : s.grid.length;
  const surface: Point[] = points.map((p) => [p.distanceM, p.elevation]);
  const notes: string[] = [];
  if (lengthM < domain) {
    const iceFreeFrom = lengthM + 1;
    surface.push([iceFreeFrom, piecewiseLinear(s.bed)(iceFreeFrom)]);
    for (const [x, z] of s.bed) if (x > iceFreeFrom) surface.push([x, z]);
    notes.push(`The ice ends at the line's end (${km(lengthM)}); below it the surface follows the bed, so the valley there starts ice-free.`);
  }
  const next: Scenario = { ...s, grid: { ...s.grid, length: domain }, surface };
  const bedEnd = s.bed[s.bed.length - 1][0];
  if (domain > bedEnd) notes.push(`The bed's last point is at ${km(bedEnd)}; beyond it the bed is held at its last elevation.`);
  const longerThanDomain = lengthM > domain;
  return { scenario: next, longerThanDomain, domainToLineEnd, notes };
}
