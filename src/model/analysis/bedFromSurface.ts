/**
 * The bed from the surface as an analysis job (the analysis worker's "bed from the surface"):
 * invertBed (inversion/invertBed.ts) on the scenario's observed surface and terminus, with the
 * rate factor fitted to the radar thickness points only when asked. When it is not fitted, the
 * misfit to the radar points is still reported, of the thickness with A as given. One step: the
 * inversion takes milliseconds, so it runs in one slice.
 */
import { DEFAULT_SMOOTHING_METRES, invertBed, type InversionResult, type InversionScenario } from '../inversion/invertBed';
import { observationMisfit } from './observationMisfit';
import type { AnalysisSteps } from './stepwise';

/** Smallest and largest smoothing distance the job takes [m]; below 3 cells the inversion uses 3 cells. */
export const SMOOTHING_RANGE_METRES: [number, number] = [0, 5000];
export { DEFAULT_SMOOTHING_METRES };

export interface BedFromSurfaceOptions {
  /** Length of the running mean over the surface [m]. */
  smoothingMetres: number;
  /** Fit the rate factor's multiplier to the thickness points (when there are any). */
  fitRateFactor: boolean;
}

export interface BedFromSurface {
  inversion: InversionResult;
  /** The multiplier was fitted to thickness points. */
  fitted: boolean;
  smoothingMetres: number;
}

export function* bedFromSurfaceSteps(scenario: InversionScenario, options: BedFromSurfaceOptions): AnalysisSteps<BedFromSurface> {
  yield { fraction: 0, message: 'inverting the surface for the bed' };
  const points = scenario.observations?.thickness ?? [];
  const fitted = options.fitRateFactor && points.length > 0;
  const input: InversionScenario = fitted || !scenario.observations ? scenario : { ...scenario, observations: { ...scenario.observations, thickness: undefined } };
  const inversion = invertBed(input, { smoothingMetres: options.smoothingMetres });
  if (!fitted && points.length > 0) {
    const m = observationMisfit(inversion.x, inversion.thickness, scenario.grid.length, points);
    if (m) {
      inversion.misfit = { count: m.count, rmsMetres: m.rms, biasMetres: m.bias, weightedRms: m.normalisedRms };
      inversion.statements.push(`rate factor not fitted: the ${points.length} thickness point(s) are compared only`);
    }
  }
  return { inversion, fitted, smoothingMetres: options.smoothingMetres };
}
