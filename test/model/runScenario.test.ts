import { describe, expect, it } from 'vitest';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { NumericalFailure } from '../../src/model/numericalFailure';
import { outputTimes, runScenario, ScenarioRun, spinUpKey } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { FlowlineSimulation } from '../../src/model/simulation';

const small: Scenario = {
  format: 'firnline-scenario',
  version: 1,
  grid: { length: 3000, spacing: 100 },
  bed: [[0, 3000], [3000, 2700]],
  surface: [[0, 3080], [2000, 2820], [2100, 2790], [2200, 2700]],
  ice: { n: 3, A: 2.4e-24 },
  massBalance: { model: 'linear', ela: 2900, ablationGradient: 0.006 },
  run: { years: 50, outputEvery: 15 },
};

describe('outputTimes(run)', () => {
  it('lists 0, every outputEvery, and always the final year', () => {
    expect(outputTimes({ years: 50, outputEvery: 15 })).toEqual([0, 15, 30, 45, 50]);
    expect(outputTimes({ years: 300, outputEvery: 10 })).toHaveLength(31);
    expect(outputTimes({ years: 1, outputEvery: 0.1 })).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
  });
});

describe('runScenario(scenario)', () => {
  it('streams one frame per output time through onFrame, in order', () => {
    const seen: number[] = [];
    const report = runScenario(small, { onFrame: (frame) => seen.push(frame.time) });
    expect(seen).toEqual([0, 15, 30, 45, 50]);
    expect(report.frames.map((f) => f.time)).toEqual(seen);
  });

  it('clips the initial surface to the bed: 78.5 m at cell 0 (within 5e-10), no ice where the sketch lies below it', () => {
    const model = createFlowlineModel(small);
    // Cell 0 at x = 50 m: surface 3080 - 260 * 50 / 2000 = 3073.5, bed 3000 - 0.1 * 50 = 2995.
    expect(model.initialThickness[0]).toBeCloseTo(78.5, 9);
    expect(model.initialThickness[25]).toBe(0);
  });

  it('gives bit-identical results when run twice', () => {
    const a = runScenario(small).frames.at(-1)!.fields.thickness;
    const b = runScenario(small).frames.at(-1)!.fields.thickness;
    expect(Array.from(a)).toEqual(Array.from(b));
  });
});

describe('numerical failure', () => {
  it('stops with the model year and position when the thickness becomes non-finite', () => {
    const model = createFlowlineModel(small);
    // Sabotage the balance at one cell to inject a NaN, as a broken formulation would.
    const original = model.iceBalance;
    model.iceBalance = (surface, warming, precipitationFactor, out) => {
      original(surface, warming, precipitationFactor, out);
      out[7] = Number.NaN;
    };
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    expect(() => simulation.advanceTo(10)).toThrowError(NumericalFailure);
    try {
      simulation.advanceTo(10);
    } catch (error) {
      expect((error as NumericalFailure).position).toBe(750);
      expect((error as NumericalFailure).message).toMatch(/model year .* near x = 750 m/);
    }
  });
});

describe('reusing a spin-up', () => {
  const spun: Scenario = { ...small, spinup: true, warming: [[0, 0], [20, 1]] };

  it('spinUpKey ignores the name, the run and the warming after year 0, and nothing else', () => {
    const key = spinUpKey(spun);
    expect(spinUpKey({ ...spun, name: 'other', run: { years: 80, outputEvery: 40 }, warming: [[0, 0], [10, 3]] })).toBe(key);
    expect(spinUpKey({ ...spun, warming: [[0, 0.5], [10, 3]] })).not.toBe(key);
    expect(spinUpKey({ ...spun, ice: { n: 3, A: 2.5e-24 } })).not.toBe(key);
  });

  it('a run given an earlier spin-up of the same glacier gives bit-identical frames', () => {
    const first = new ScenarioRun(spun);
    while (first.nextFrame());
    const again = new ScenarioRun(spun, { reuseSpinUp: first.spinUpResult() });
    while (again.nextFrame());
    expect(again.frames.map((f) => Array.from(f.fields.thickness))).toEqual(first.frames.map((f) => Array.from(f.fields.thickness)));
    expect(again.report().summary.spinup).toMatchObject({ reused: true, years: first.report().summary.spinup!.years });
  });
});
