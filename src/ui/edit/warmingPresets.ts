/** Warming scenarios dT(t) [year a, K] offered as starting points; the curve can then be dragged. */
import type { Point } from '../../model/scenario';

export type WarmingPreset = 'step' | 'ramp-hold' | 'ramp-rising';

/**
 * step: the full warming within the first year; ramp-hold: linear to `kelvin` over `rampYears`,
 * then held; ramp-rising: the same rate kept to the end of the run.
 */
export function warmingPreset(preset: WarmingPreset, kelvin: number, rampYears: number, runYears: number): Point[] {
  switch (preset) {
    case 'step':
      return [[0, 0], [1, kelvin]];
    case 'ramp-hold':
      return [[0, 0], [rampYears, kelvin]];
    case 'ramp-rising': {
      const end = Math.max(runYears, rampYears);
      return [[0, 0], [end, Number(((kelvin * end) / rampYears).toPrecision(6))]];
    }
  }
}
