/**
 * Committed change: the length and volume change still to come if the climate stopped changing.
 *
 * Method: from the state at model year t, hold the warming at dT(t) and run to a steady state
 * (the criterion of steadyState.ts); committed change = steady value - value at t. This is the
 * "committed" or "disequilibrium" idea of e.g. Jóhannesson, Raymond & Waddington (1989,
 * J. Glaciol. 35(121)): a glacier lags its climate by about its response time, so part of the
 * response to past warming is still to come. A glacier already in steady state has none: the
 * held run then starts steady, and the change is what the steady-state test leaves (within it).
 * The stepwise form also records the held run's length and volume, for a chart of what is to come.
 */
import { createFlowlineModel } from '../createFlowlineModel';
import type { FlowlineModel } from '../flowlineModel';
import { glacierExtent, iceVolume } from '../glacierExtent';
import type { Scenario } from '../scenario';
import { FlowlineSimulation } from '../simulation';
import { DEFAULT_SPINUP_MAX_YEARS, spinUp } from '../spinUp';
import { todayStartSteps } from '../todayStart';
import { steadyUnderWarmingSteps } from './steadyUnderWarming';
import { runToEnd, type AnalysisSteps } from './stepwise';

/** The glacier along the held run. */
export interface HeldRunPoint {
  /** Model year [a] (the year held from, plus the years of the held run). */
  year: number;
  /** [m] */
  length: number;
  /** [m^3] */
  volume: number;
}

export interface CommittedChange {
  /** Model year the climate is held from [a]. */
  year: number;
  /** Warming held [K]. */
  warming: number;
  lengthNow: number;
  volumeNow: number;
  lengthSteady: number;
  volumeSteady: number;
  /** Further change still to come: steady minus now [m], [m^3]. */
  lengthChange: number;
  volumeChange: number;
  /** Model years the held run took to become steady [a]; whether it did within its limit. */
  yearsToSteady: number;
  converged: boolean;
  /** Length and volume every few model years of the held run, from `year` to the steady state. */
  path: HeldRunPoint[];
}

/** Committed change of a given state under a held warming, in steps (see stepwise.ts). */
export function* committedChangeSteps(
  model: FlowlineModel,
  thickness: Float64Array,
  warming: number,
  year = 0,
): AnalysisSteps<CommittedChange> {
  const lengthNow = glacierExtent(model.grid, thickness).length;
  const volumeNow = iceVolume(model.grid, thickness);
  const path: HeldRunPoint[] = [{ year, length: lengthNow, volume: volumeNow }];
  const steps = steadyUnderWarmingSteps(model, thickness, warming, DEFAULT_SPINUP_MAX_YEARS, model.precipitationFactorAt(year));
  let next = steps.next();
  while (!next.done) {
    const run = next.value;
    path.push({ year: year + run.years, length: glacierExtent(model.grid, run.thickness).length, volume: iceVolume(model.grid, run.thickness) });
    // The held run ends when steady, which cannot be foreseen: no fraction, only the years.
    yield { fraction: undefined, message: `held run at ${run.years} of at most ${DEFAULT_SPINUP_MAX_YEARS} model years` };
    next = steps.next();
  }
  const steady = next.value;
  const lengthSteady = glacierExtent(model.grid, steady.thickness).length;
  const volumeSteady = iceVolume(model.grid, steady.thickness);
  if (path[path.length - 1].year !== year + steady.years) path.push({ year: year + steady.years, length: lengthSteady, volume: volumeSteady });
  return {
    year,
    warming,
    lengthNow,
    volumeNow,
    lengthSteady,
    volumeSteady,
    lengthChange: lengthSteady - lengthNow,
    volumeChange: volumeSteady - volumeNow,
    yearsToSteady: steady.years,
    converged: steady.converged,
    path,
  };
}

/** Committed change of a given state under a held warming. */
export function committedChange(model: FlowlineModel, thickness: Float64Array, warming: number, year = 0): CommittedChange {
  return runToEnd(committedChangeSteps(model, thickness, warming, year));
}

/**
 * Runs a scenario (with its spin-up, if asked, or its start from today's glacier) to model year
 * `year`, then holds its warming there.
 */
export function committedChangeAtYear(scenario: Scenario, year: number): CommittedChange {
  const model = createFlowlineModel(scenario);
  const start = scenario.start
    ? runToEnd(todayStartSteps(model, scenario)).thickness
    : scenario.spinup
      ? spinUp(model, model.initialThickness).thickness
      : model.initialThickness;
  const simulation = new FlowlineSimulation(model, start);
  simulation.advanceTo(year);
  return committedChange(model, simulation.thickness, model.warmingAt(year), year);
}
