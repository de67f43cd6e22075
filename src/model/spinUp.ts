/**
 * Spin-up: run under the year-0 climate (warming held at dT(0)) until the glacier is steady by
 * the criterion in steadyState.ts, or until `maxYears`. The spin-up has its own mass budget; the
 * run proper starts at year 0 from the spun-up thickness.
 */
import type { FlowlineModel } from './flowlineModel';
import { FlowlineSimulation } from './simulation';
import { endsInSteadyState } from './steadyState';

/** Longest spin-up before giving up [model years]. */
export const DEFAULT_SPINUP_MAX_YEARS = 20000;
/** How often the steady-state test runs [model years]. */
const CHECK_EVERY_YEARS = 10;

export interface SpinUpResult {
  thickness: Float64Array;
  years: number;
  converged: boolean;
  steps: number;
}

export function spinUp(
  model: FlowlineModel,
  startThickness: Float64Array,
  options: { maxYears?: number; onProgress?: (year: number, maxYears: number) => void } = {},
): SpinUpResult {
  const maxYears = options.maxYears ?? DEFAULT_SPINUP_MAX_YEARS;
  const year0Warming = model.warmingAt(0);
  const simulation = new FlowlineSimulation(model, startThickness, () => year0Warming);
  let converged = false;
  while (simulation.time < maxYears) {
    simulation.advanceTo(Math.min(maxYears, simulation.time + CHECK_EVERY_YEARS));
    options.onProgress?.(simulation.time, maxYears);
    if (endsInSteadyState(simulation.annual, model.grid.spacing)) {
      converged = true;
      break;
    }
  }
  return { thickness: simulation.thickness, years: simulation.time, converged, steps: simulation.steps };
}
