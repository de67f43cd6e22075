/**
 * The live preview's steady glacier is the run's own spin-up: its terminus and volume equal, to
 * the bit, those of a model run's first output (year 0, after the spin-up), which is what the
 * command line writes for year 0 as well. Also: a valley that holds no glacier says so, and a
 * spin-up stopped at its cap says it is not steady.
 */
import { describe, expect, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { STEADY_PREVIEW_MAX_YEARS, steadyGlacierSteps } from '../../src/model/steadyGlacier';
import { checkedJson } from '../helpers/checkedScenario';

const demoScenario = checkedJson(demo);

function yearZeroOfRun(scenario: Scenario) {
  const report = runScenario({ ...scenario, spinup: true, run: { years: 1, outputEvery: 1 } });
  return { numbers: report.frames[0].numbers, thickness: report.frames[0].fields.thickness, spinup: report.summary.spinup };
}

describe('steadyGlacierSteps(scenario)', () => {
  it('ends on the glacier a run spins up to: same thickness, terminus and volume as the run at year 0 (demo)', () => {
    const glacier = runToEnd(steadyGlacierSteps(demoScenario));
    const run = yearZeroOfRun(demoScenario);
    expect(glacier.converged).toBe(true);
    expect(run.spinup?.converged).toBe(true);
    expect(glacier.years).toBe(run.spinup?.years);
    expect(glacier.terminus).toBe(run.numbers.terminus);
    expect(glacier.volume).toBe(run.numbers.volume);
    expect(Array.from(glacier.thickness)).toEqual(Array.from(run.thickness));
    // The demo's steady glacier, as the preview text states it.
    expect(glacier.terminus / 1000).toBeCloseTo(9.35, 2);
    expect(glacier.volume / 1e9).toBeCloseTo(1.565, 3);
    expect(glacier.iceFree).toBe(false);
  });

  it('matches the run for a unit-width variant with a lower ELA as well', () => {
    const { width: _width, ...unitWidth } = demoScenario;
    const lower = checkedJson({ ...unitWidth, massBalance: { ...demoScenario.massBalance, ela: 2700 } });
    const glacier = runToEnd(steadyGlacierSteps(lower));
    const run = yearZeroOfRun(lower);
    expect(glacier.terminus).toBe(run.numbers.terminus);
    expect(glacier.volume).toBe(run.numbers.volume);
    expect(glacier.terminus).toBeGreaterThan(9350);
  });

  it('says no glacier survives when the ELA lies above the whole valley', () => {
    const high = checkedJson({ ...demoScenario, massBalance: { ...demoScenario.massBalance, ela: 4500 } });
    const glacier = runToEnd(steadyGlacierSteps(high));
    expect(glacier.iceFree).toBe(true);
    expect(glacier.converged).toBe(true);
    expect(Number.isNaN(glacier.terminus)).toBe(true);
    expect(glacier.volume).toBeLessThan(1); // at most round-off of ice thinner than 1 m
  });

  it('stops at its cap and says it is not steady', () => {
    const glacier = runToEnd(steadyGlacierSteps(demoScenario, 100));
    expect(glacier.converged).toBe(false);
    expect(glacier.years).toBe(100);
    expect(glacier.maxYears).toBe(100);
    expect(STEADY_PREVIEW_MAX_YEARS).toBeGreaterThan(glacier.years);
  });
});
