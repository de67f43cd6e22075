/**
 * Calibration of the climate to an observed terminus: find the mass-balance parameter for which
 * the spun-up glacier's terminus lies within `tolerance` of the observed position.
 *
 * Parameter by balance model: linear, the ELA itself [m a.s.l.]; table, an upward shift of the
 * whole table [m]; degree-day, an offset added to the mean temperature [K]. Raising any of them
 * shortens the glacier, so terminus(p) - observed falls with p.
 *
 * Method: bracketing by steps that double outward from the scenario's own value until the sign
 * changes, then bisection (e.g. Press et al., Numerical Recipes, 3rd ed., sec. 9.1); then, since
 * a band of parameters gives the same terminus cell, bisection for both edges of that band and
 * the band's middle as the answer, with the band as its uncertainty from the grid. Bisection
 * rather than Brent's method: the terminus moves in whole grid cells, so terminus(p) is a
 * staircase and an interpolating step gains little over halving, which always converges. Every
 * trial spins up from the scenario's initial ice, so the answer does not depend on the path.
 * The stepwise form (stepwise.ts) yields during each spin-up; `calibrateTerminus` runs it through.
 */
import { createFlowlineModel } from '../createFlowlineModel';
import { glacierExtent } from '../glacierExtent';
import type { Scenario } from '../scenario';
import { SpinUp } from '../spinUp';
import { SLICE_YEARS } from './steadyUnderWarming';
import { runToEnd, type AnalysisSteps } from './stepwise';

export type CalibrationParameter = 'ela' | 'table-shift' | 'temperature-offset';

export interface CalibrationTrial {
  parameter: number;
  /** Spun-up terminus [m]; 0 when the valley ends ice-free (shorter than any glacier). */
  terminus: number;
  converged: boolean;
}

export interface CalibrationResult {
  parameterName: CalibrationParameter;
  /** Unit of the parameter: "m a.s.l.", "m" or "K". */
  unit: string;
  /** Best parameter found and its terminus [m]. */
  parameter: number;
  terminus: number;
  /** |terminus - observed| <= tolerance. */
  matched: boolean;
  /** Spin-ups run (bracketing and bisection). */
  iterations: number;
  /** Parameters found to give a matching terminus, lowest and highest (the answer is the middle). */
  matchBand: [number, number] | undefined;
  trials: CalibrationTrial[];
  /** The calibrated scenario (the parameter applied). */
  scenario: Scenario;
}

export interface CalibrationOptions {
  /** Observed terminus [m along the flowline]. */
  observedTerminus: number;
  /** Accepted mismatch [m]; below half a grid cell a match may not exist. */
  tolerance: number;
  /** First bracketing step (default 50 m, or 0.5 K for degree-day). */
  initialStep?: number;
  /** Bisection stops when the bracket is narrower than this (default 1e-3 of the initial step). */
  parameterTolerance?: number;
  maxIterations?: number;
  /** Longest spin-up of each trial [model years]. */
  maxSpinUpYears?: number;
}

export function calibrationParameter(scenario: Scenario): { name: CalibrationParameter; unit: string; start: number } {
  switch (scenario.massBalance.model) {
    case 'linear':
      return { name: 'ela', unit: 'm a.s.l.', start: scenario.massBalance.ela };
    case 'table':
      return { name: 'table-shift', unit: 'm', start: 0 };
    case 'degree-day':
      return { name: 'temperature-offset', unit: 'K', start: 0 };
  }
}

/** The scenario with the calibration parameter set to `value`. */
export function withCalibrationParameter(scenario: Scenario, value: number): Scenario {
  const mb = scenario.massBalance;
  switch (mb.model) {
    case 'linear':
      return { ...scenario, massBalance: { ...mb, ela: value } };
    case 'table':
      return { ...scenario, massBalance: { ...mb, points: mb.points.map(([z, b]) => [z + value, b] as const) } };
    case 'degree-day':
      return { ...scenario, massBalance: { ...mb, meanTemperature: mb.meanTemperature + value } };
  }
}

export function spunUpTerminus(scenario: Scenario, maxYears?: number): { terminus: number; converged: boolean } {
  return runToEnd(spunUpTerminusSteps(scenario, maxYears));
}

/** spunUpTerminus in steps: yields the spin-up years reached. */
function* spunUpTerminusSteps(scenario: Scenario, maxYears?: number): Generator<number, { terminus: number; converged: boolean }, void> {
  const model = createFlowlineModel(scenario);
  const run = new SpinUp(model, model.initialThickness, maxYears);
  while (!run.advance(SLICE_YEARS)) yield run.years;
  const steady = run.result();
  const terminus = glacierExtent(model.grid, steady.thickness).terminus;
  return { terminus: Number.isNaN(terminus) ? 0 : terminus, converged: steady.converged };
}

function describeParameter(name: CalibrationParameter, value: number): string {
  switch (name) {
    case 'ela':
      return `ELA ${value.toFixed(1)} m a.s.l.`;
    case 'table-shift':
      return `table shifted ${value.toFixed(1)} m`;
    case 'temperature-offset':
      return `temperature offset ${value.toFixed(3)} K`;
  }
}

export function calibrateTerminus(scenario: Scenario, options: CalibrationOptions): CalibrationResult {
  return runToEnd(calibrateTerminusSteps(scenario, options));
}

/** The calibration in steps; progress has no fraction (the number of spin-ups is not known ahead). */
export function* calibrateTerminusSteps(scenario: Scenario, options: CalibrationOptions): AnalysisSteps<CalibrationResult> {
  const { name, unit, start } = calibrationParameter(scenario);
  const step0 = options.initialStep ?? (name === 'temperature-offset' ? 0.5 : 50);
  const parameterTolerance = options.parameterTolerance ?? 1e-3 * step0;
  const maxIterations = options.maxIterations ?? 80;
  const trials: CalibrationTrial[] = [];
  const trial = function* (parameter: number): AnalysisSteps<number> {
    const what = `spin-up ${trials.length + 1} (at most ${maxIterations}): ${describeParameter(name, parameter)}`;
    const steps = spunUpTerminusSteps(withCalibrationParameter(scenario, parameter), options.maxSpinUpYears);
    let next = steps.next();
    while (!next.done) {
      yield { fraction: undefined, message: `${what}, model year ${next.value}` };
      next = steps.next();
    }
    const { terminus, converged } = next.value;
    trials.push({ parameter, terminus, converged });
    return terminus - options.observedTerminus;
  };
  const within = (g: number) => Math.abs(g) <= options.tolerance;
  const budgetLeft = () => trials.length < maxIterations;
  const result = (parameter: number, band: [number, number] | undefined): CalibrationResult => {
    const t = trials.find((x) => x.parameter === parameter)!;
    return {
      parameterName: name,
      unit,
      parameter,
      terminus: t.terminus,
      matched: within(t.terminus - options.observedTerminus),
      iterations: trials.length,
      matchBand: band,
      trials,
      scenario: withCalibrationParameter(scenario, parameter),
    };
  };
  const closest = () =>
    trials.reduce((a, b) =>
      Math.abs(b.terminus - options.observedTerminus) < Math.abs(a.terminus - options.observedTerminus) ? b : a,
    ).parameter;

  // 1. Bracketing: too long -> raise the parameter, too short -> lower it, doubling the step.
  let lo = Number.NEGATIVE_INFINITY; // largest parameter known to give too long a glacier
  let hi = Number.POSITIVE_INFINITY; // smallest known to give too short a glacier
  let match: number | undefined;
  const classify = function* (p: number): AnalysisSteps<void> {
    const g = yield* trial(p);
    if (within(g)) match = p;
    else if (g > 0) lo = Math.max(lo, p);
    else hi = Math.min(hi, p);
  };
  yield* classify(start);
  for (let step = step0; match === undefined && !(lo > -Infinity && hi < Infinity) && budgetLeft(); step *= 2) {
    yield* classify(lo > -Infinity ? start + step : start - step);
  }
  // 2. Bisection until a parameter matches.
  while (match === undefined && lo > -Infinity && hi < Infinity && hi - lo > parameterTolerance && budgetLeft()) {
    yield* classify(0.5 * (lo + hi));
  }
  if (match === undefined) return result(closest(), undefined);

  // 3. The terminus is a staircase: every parameter in a band gives the matching terminus. Find
  // the band's edges (bisection on each side) and return its middle, the least biased choice.
  const found: number = match;
  const edge = function* (direction: 1 | -1): AnalysisSteps<number> {
    let inside = found;
    let outside = direction > 0 ? hi : lo;
    for (let step = step0; !Number.isFinite(outside) && budgetLeft(); step *= 2) {
      const p = inside + direction * step;
      if (within(yield* trial(p))) inside = p;
      else outside = p;
    }
    while (Number.isFinite(outside) && Math.abs(outside - inside) > parameterTolerance && budgetLeft()) {
      const p = 0.5 * (inside + outside);
      if (within(yield* trial(p))) inside = p;
      else outside = p;
    }
    return inside;
  };
  const band: [number, number] = [yield* edge(-1), yield* edge(1)];
  const middle = 0.5 * (band[0] + band[1]);
  if (!trials.some((t) => t.parameter === middle)) yield* trial(middle);
  return result(within(trials[trials.length - 1].terminus - options.observedTerminus) ? middle : found, band);
}
