import { describe, expect, it } from 'vitest';
import { committedChange, committedChangeAtYear } from '../../src/model/analysis/committedChange';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { spinUp } from '../../src/model/spinUp';
import { STEADY_IMBALANCE } from '../../src/model/steadyState';
import { testValley } from './valley';

describe('committed change', () => {
  it('is zero for an ice-free valley that stays ice-free', () => {
    // ELA above the whole bed: nothing can grow, nothing is there.
    const scenario = testValley({ massBalance: { model: 'linear', ela: 3500, ablationGradient: 0.007 }, spinup: false });
    const model = createFlowlineModel(scenario);
    const result = committedChange(model, model.initialThickness, 0);
    expect(result.lengthChange).toBe(0);
    expect(result.volumeChange).toBe(0);
  });

  it('is zero for a glacier already in steady state: length change exactly 0, volume change below STEADY_IMBALANCE (1e-3) of the volume', () => {
    const model = createFlowlineModel(testValley());
    const steady = spinUp(model, model.initialThickness);
    expect(steady.converged).toBe(true);
    const result = committedChange(model, steady.thickness, 0);
    console.info(
      `steady glacier: committed length change ${result.lengthChange} m, volume change ${result.volumeChange.toExponential(2)} m^3 ` +
        `of ${result.volumeNow.toExponential(3)} m^3, held run ${result.yearsToSteady} a`,
    );
    expect(result.converged).toBe(true);
    // The terminus does not move at all; the volume by no more than the steady-state test allows
    // over its window (STEADY_IMBALANCE of the turnover, itself far below the volume).
    expect(result.lengthChange).toBe(0);
    expect(Math.abs(result.volumeChange)).toBeLessThan(STEADY_IMBALANCE * result.volumeNow);
  });

  it('after a warming, further retreat is still to come', () => {
    const scenario = testValley({ warming: [[0, 0], [30, 1]] });
    const result = committedChangeAtYear(scenario, 30);
    console.info(
      `after +1 K over 30 a: length now ${result.lengthNow} m, committed ${result.lengthChange} m; ` +
        `volume committed ${((100 * result.volumeChange) / result.volumeNow).toFixed(1)} %`,
    );
    expect(result.warming).toBe(1);
    expect(result.converged).toBe(true);
    expect(result.lengthChange).toBeLessThan(0);
    expect(result.volumeChange).toBeLessThan(0);
  });
});
