/**
 * The scenario with an imported survey profile. Distances are shifted so the first row is at
 * x = 0 (the head of the domain) and the domain ends at the last row; the cell spacing is kept
 * when it divides the new length, else the nearest one that does. Bed always replaced; surface
 * and width replaced when the file has them (rows with an empty cell give no point), otherwise
 * the glacier starts ice-free (the old surface would not fit the new bed) and the width is kept.
 */
import type { CsvProfileRow } from '../../csvImport/csvProfileImport';
import type { Point, Scenario } from '../../model/scenario';
import { gridSpacingFor } from './generatedValleyScenario';

export interface ImportedProfile {
  scenario: Scenario;
  /** Distance subtracted from every row [m]. */
  shiftM: number;
  notes: string[];
}

export function importedProfileScenario(s: Scenario, rows: readonly CsvProfileRow[], columns: { surface: boolean; width: boolean }): ImportedProfile {
  const shiftM = rows[0]?.distanceM ?? 0;
  const x = (r: CsvProfileRow) => r.distanceM - shiftM;
  const length = rows.length ? x(rows[rows.length - 1]) : 0;
  const bed: Point[] = rows.map((r) => [x(r), r.bed]);
  const surface: Point[] = rows.filter((r) => r.surface !== undefined).map((r) => [x(r), r.surface as number]);
  const width: Point[] = rows.filter((r) => r.width !== undefined).map((r) => [x(r), r.width as number]);
  const { surface: _oldSurface, width: oldWidth, ...rest } = s;
  const notes: string[] = [];
  if (shiftM !== 0) notes.push(`Distances are shifted by −${shiftM} m so the first row is at the head of the domain (0 km).`);
  const next: Scenario = { ...rest, grid: { length, spacing: gridSpacingFor(length, s.grid.spacing) }, bed };
  if (columns.surface && surface.length) next.surface = surface;
  else notes.push('No surface in the file: the glacier starts ice-free.');
  if (columns.width && width.length) next.width = width;
  else if (oldWidth) {
    next.width = oldWidth;
    notes.push('No width in the file: the current width profile is kept.');
  }
  return { scenario: next, shiftM, notes };
}
