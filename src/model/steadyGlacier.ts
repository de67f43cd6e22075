/**
 * The steady glacier of a scenario's year-0 climate, for the live preview after an edit: the
 * run's own spin-up (spinUp.ts: same start from the sketched surface, same steady-state criterion
 * of steadyState.ts, same striding), capped at fewer years, and its terminus and volume from the
 * run's diagnostics (diagnostics.ts, glacierExtent.ts). A spin-up that converges within the cap
 * therefore ends on the very glacier a run's spin-up starts its run from.
 *
 * Starting from the sketch rather than from an ice-free valley: measured on the demo (240 and
 * 1,600 cells, ELA 2,700 to 2,900 m) both take 400 to 900 model years and reach the same terminus
 * within a cell, and only the sketch gives the run's spin-up bit for bit.
 */
import { createFlowlineModel } from './createFlowlineModel';
import { diagnoseFrame } from './diagnostics';
import type { Scenario } from './scenario';
import { SpinUp } from './spinUp';

/** Longest preview spin-up [model years]; a run's spin-up may go on to DEFAULT_SPINUP_MAX_YEARS. */
export const STEADY_PREVIEW_MAX_YEARS = 5000;
/** Model years between yields (the spin-up's steady-state check interval). */
const SLICE_YEARS = 10;

export interface SteadyGlacier {
  /** Cell centres [m], ice thickness [m] and ice surface [m a.s.l.] of the spun-up glacier. */
  x: Float64Array;
  thickness: Float64Array;
  surface: Float64Array;
  /** Model years the spin-up took [a]. */
  years: number;
  /** Steady by the criterion of steadyState.ts; false when it stopped at `maxYears`. */
  converged: boolean;
  maxYears: number;
  /** Down-valley end of the ice [m]; NaN when no glacier survives. */
  terminus: number;
  /** Ice volume [m^3] (per metre of width for a unit-width flowline). */
  volume: number;
  /** No cell holds MIN_GLACIER_THICKNESS of ice. */
  iceFree: boolean;
}

/** Yields the spin-up's model years every 10 years; returns the steady (or capped) glacier. */
export function* steadyGlacierSteps(scenario: Scenario, maxYears = STEADY_PREVIEW_MAX_YEARS): Generator<number, SteadyGlacier, void> {
  const model = createFlowlineModel(scenario);
  const spin = new SpinUp(model, model.initialThickness, maxYears);
  while (!spin.advance(SLICE_YEARS)) yield spin.years;
  const result = spin.result();
  const thickness = Float64Array.from(result.thickness);
  const { fields, numbers } = diagnoseFrame(model, thickness, 0);
  return {
    x: Float64Array.from(model.grid.x),
    thickness,
    surface: Float64Array.from(fields.surface),
    years: result.years,
    converged: result.converged,
    maxYears,
    terminus: numbers.terminus,
    volume: numbers.volume,
    iceFree: !Number.isFinite(numbers.terminus),
  };
}
