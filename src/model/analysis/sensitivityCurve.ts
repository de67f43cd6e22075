/**
 * Steady-state sensitivity curve: steady terminus, length and volume against a warming held
 * constant, swept up through the warmings and back down again. Each step starts from the
 * previous steady state (a quasi-static path), so where the glacier has more than one steady
 * state for the same climate the up and down branches differ: a hysteresis loop. The classic
 * case is a plateau near the ELA, where ice lifts its own surface into the accumulation area
 * (the small-ice-cap instability, e.g. Weertman 1961, J. Geophys. Res. 66(11); from memory);
 * test/analysis/sensitivityCurve.test.ts shows it.
 */
import type { FlowlineModel } from '../flowlineModel';
import { glacierExtent, iceVolume } from '../glacierExtent';
import { steadyUnderWarmingSteps } from './steadyUnderWarming';
import { runToEnd, type AnalysisSteps } from './stepwise';

export interface SteadyPoint {
  /** Held warming [K]. */
  warming: number;
  branch: 'up' | 'down';
  /** [m], NaN when ice-free. */
  terminus: number;
  length: number;
  /** [m^3] */
  volume: number;
  /** Model years this step took; whether it met the steady-state test. */
  years: number;
  converged: boolean;
}

/** Warmings from `from` to `to` in steps of `step` (both ends included). */
export function warmingLadder(from: number, to: number, step: number): number[] {
  const count = Math.round((to - from) / step);
  return Array.from({ length: count + 1 }, (_, k) => Number((from + k * step).toPrecision(12)));
}

/** A held warming as people write it: with its sign, to two decimals at most. */
function signed(warming: number): string {
  return `${warming > 0 ? '+' : warming < 0 ? '\u2212' : ''}${Number(Math.abs(warming).toFixed(2))} K`;
}

/**
 * `warmings` in increasing order. The up branch starts from `startThickness` at the first
 * warming; the down branch starts from the up branch's last state and returns to the first.
 * Stepwise: progress is the share of steady states found so far.
 */
export function* sensitivityCurveSteps(
  model: FlowlineModel,
  startThickness: Float64Array,
  warmings: readonly number[],
  maxYearsPerStep?: number,
): AnalysisSteps<SteadyPoint[]> {
  const points: SteadyPoint[] = [];
  const total = 2 * warmings.length - 1;
  let state = startThickness;
  function* visit(warming: number, branch: SteadyPoint['branch']): AnalysisSteps<void> {
    const steps = steadyUnderWarmingSteps(model, state, warming, maxYearsPerStep);
    const what = `${branch === 'up' ? 'warming up' : 'cooling back'}: steady state ${points.length + 1} of ${total} (${signed(warming)})`;
    let next = steps.next();
    while (!next.done) {
      yield { fraction: points.length / total, message: `${what}, model year ${next.value.years}` };
      next = steps.next();
    }
    const steady = next.value;
    state = steady.thickness;
    const extent = glacierExtent(model.grid, state);
    points.push({
      warming,
      branch,
      terminus: extent.terminus,
      length: extent.length,
      volume: iceVolume(model.grid, state),
      years: steady.years,
      converged: steady.converged,
    });
    yield { fraction: points.length / total, message: what };
  }
  for (const warming of warmings) yield* visit(warming, 'up');
  for (let k = warmings.length - 2; k >= 0; k--) yield* visit(warmings[k], 'down');
  return points;
}

export function sensitivityCurve(
  model: FlowlineModel,
  startThickness: Float64Array,
  warmings: readonly number[],
  maxYearsPerStep?: number,
): SteadyPoint[] {
  return runToEnd(sensitivityCurveSteps(model, startThickness, warmings, maxYearsPerStep));
}
