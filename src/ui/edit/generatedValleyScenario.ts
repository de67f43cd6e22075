/**
 * The scenario with a generated valley: the new bed and domain length, the cell spacing kept when
 * it still divides the length (else the nearest spacing that does), the width profile stretched
 * to the new length so its shape is kept, and the initial surface removed (the old one would not
 * fit the new bed; draw or fill a new one).
 */
import type { Point, Scenario } from '../../model/scenario';
import { generateValley, type ValleyOptions } from './geometry/generateValley';

export function gridSpacingFor(length: number, spacing: number): number {
  const cells = length / spacing;
  if (Math.abs(cells - Math.round(cells)) < 1e-9 * cells) return spacing;
  return length / Math.max(2, Math.round(cells));
}

export function generatedValleyScenario(s: Scenario, options: ValleyOptions): Scenario {
  const bed = generateValley(options);
  const stretch = options.length / s.grid.length;
  const width = s.width?.map(([x, w]) => [x * stretch, w] as Point);
  const { surface: _surface, ...rest } = s;
  return {
    ...rest,
    ...(width ? { width } : {}),
    grid: { length: options.length, spacing: gridSpacingFor(options.length, s.grid.spacing) },
    bed,
  };
}
