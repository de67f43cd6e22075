/**
 * A steady state under a warming held constant: the spin-up of spinUp.ts (same steady-state
 * criterion, same striding) applied to a copy of the model whose warming is that constant. The
 * building block of the committed-change and sensitivity analyses.
 */
import type { FlowlineModel } from '../flowlineModel';
import { DEFAULT_SPINUP_MAX_YEARS, SpinUp, type SpinUpResult } from '../spinUp';

export function steadyUnderWarming(
  model: FlowlineModel,
  startThickness: Float64Array,
  warming: number,
  maxYears = DEFAULT_SPINUP_MAX_YEARS,
): SpinUpResult {
  const held: FlowlineModel = { ...model, warmingAt: () => warming };
  const run = new SpinUp(held, startThickness, maxYears);
  while (!run.advance(maxYears));
  return run.result();
}
