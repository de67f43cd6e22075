/**
 * Spin-up: run under the year-0 climate (warming held at dT(0)) until the glacier is steady by
 * the criterion in steadyState.ts, or until `maxYears`. The spin-up has its own mass budget; the
 * run proper starts at year 0 from the spun-up thickness. `SpinUp` advances in slices so that a
 * worker can report progress and stay responsive; `spinUp` runs it to the end.
 */
import type { FlowlineModel } from './flowlineModel';
import { FlowlineSimulation } from './simulation';
import { endsInSteadyState } from './steadyState';

/** Longest spin-up before giving up [model years]. */
export const DEFAULT_SPINUP_MAX_YEARS = 20000;
/** How often the steady-state test runs at first [model years]. */
const CHECK_EVERY_YEARS = 10;
/**
 * Longest implicit step in a spin-up [a]. Only the end state matters, and the steady state of
 * backward Euler does not depend on the step, so the implicit spin-up strides (pseudo-transient
 * continuation, e.g. Kelley & Keyes 1998, SIAM J. Numer. Anal. 35(2)). Measured on the demo:
 * longer limits (20-500 a) need more Newton iterations in all, as the advancing margin makes
 * long steps hard; 10 a was the cheapest.
 */
const SPINUP_MAX_STEP_YEARS = 10;

export interface SpinUpResult {
  thickness: Float64Array;
  years: number;
  converged: boolean;
  steps: number;
}

export class SpinUp {
  readonly maxYears: number;
  private readonly simulation: FlowlineSimulation;
  private readonly striding: boolean;
  converged = false;

  /** `warming`: the warming held [K]; default dT(0) (a transient start holds another). */
  constructor(model: FlowlineModel, startThickness: Float64Array, maxYears = DEFAULT_SPINUP_MAX_YEARS, warming = model.warmingAt(0)) {
    this.maxYears = maxYears;
    const year0Warming = warming;
    const year0Precipitation = model.precipitationFactorAt(0);
    this.striding = model.numerics.scheme === 'implicit';
    this.simulation = new FlowlineSimulation(
      { ...model, warmingAt: () => year0Warming, precipitationFactorAt: () => year0Precipitation },
      startThickness,
      () => year0Warming,
      0,
      this.striding ? { recordEvery: 'target', maxStepYears: SPINUP_MAX_STEP_YEARS } : { recordEvery: CHECK_EVERY_YEARS },
    );
  }

  get done(): boolean {
    return this.converged || this.simulation.time >= this.maxYears;
  }

  get years(): number {
    return this.simulation.time;
  }

  /** The glacier now [m] (live: copy it to keep it). */
  get thickness(): Float64Array {
    return this.simulation.thickness;
  }

  /** Advances by up to `years` model years (in steady-state checks of 10 years); true when done. */
  advance(years: number): boolean {
    const until = Math.min(this.maxYears, this.simulation.time + years);
    while (!this.done && this.simulation.time < until) {
      this.simulation.advanceTo(Math.min(this.maxYears, this.simulation.time + CHECK_EVERY_YEARS));
      if (endsInSteadyState(this.simulation.annual, this.simulation.model.grid.spacing)) this.converged = true;
    }
    return this.done;
  }

  result(): SpinUpResult {
    const s = this.simulation;
    return { thickness: s.thickness, years: s.time, converged: this.converged, steps: s.steps };
  }
}

export function spinUp(
  model: FlowlineModel,
  startThickness: Float64Array,
  options: { maxYears?: number; onProgress?: (year: number, maxYears: number) => void } = {},
): SpinUpResult {
  const run = new SpinUp(model, startThickness, options.maxYears);
  while (!run.advance(CHECK_EVERY_YEARS)) options.onProgress?.(run.years, run.maxYears);
  options.onProgress?.(run.years, run.maxYears);
  return run.result();
}
