/**
 * A steady state under a warming held constant: the spin-up of spinUp.ts (same steady-state
 * criterion, same striding) applied to a copy of the model whose warming is that constant. The
 * building block of the committed-change and sensitivity analyses. The stepwise form yields the
 * live spin-up every SLICE_YEARS; advancing in slices lands on the same check times as one call.
 */
import type { FlowlineModel } from '../flowlineModel';
import { DEFAULT_SPINUP_MAX_YEARS, SpinUp, type SpinUpResult } from '../spinUp';
import { runToEnd } from './stepwise';

/** Model years between yields: the spin-up's own steady-state check interval. */
export const SLICE_YEARS = 10;

/** Yields the spin-up under way (its `years` and live `thickness`) until it is steady or at `maxYears`. */
export function* steadyUnderWarmingSteps(
  model: FlowlineModel,
  startThickness: Float64Array,
  warming: number,
  maxYears = DEFAULT_SPINUP_MAX_YEARS,
  precipitationFactor = 1,
): Generator<SpinUp, SpinUpResult, void> {
  const held: FlowlineModel = { ...model, warmingAt: () => warming, precipitationFactorAt: () => precipitationFactor };
  const run = new SpinUp(held, startThickness, maxYears);
  while (!run.advance(SLICE_YEARS)) yield run;
  return run.result();
}

export function steadyUnderWarming(
  model: FlowlineModel,
  startThickness: Float64Array,
  warming: number,
  maxYears = DEFAULT_SPINUP_MAX_YEARS,
): SpinUpResult {
  return runToEnd(steadyUnderWarmingSteps(model, startThickness, warming, maxYears));
}
