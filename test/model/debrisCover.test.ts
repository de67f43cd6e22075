/**
 * Debris cover (physics/massBalance/debrisCover.ts): the hyperbolic fit of Anderson & Anderson
 * (2016) to Østrem-type melt curves, its effect on the balance field and on a glacier.
 */
import { describe, expect, it } from 'vitest';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { debrisMeltFactor } from '../../src/model/physics/massBalance/debrisCover';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';

describe('debrisMeltFactor', () => {
  it('is h*/(h* + h) with h* = 0.066 m: 1 bare, 1/2 at 6.6 cm, 0.1166 at 0.5 m (fit values from memory, arithmetic within 5e-5)', () => {
    expect(debrisMeltFactor(0)).toBe(1);
    expect(debrisMeltFactor(0.066)).toBeCloseTo(0.5, 12);
    expect(debrisMeltFactor(0.5)).toBeCloseTo(0.1166, 4);
  });
  it('lies in the bands of Østrem-type curves (from memory, wide): 0.3-0.6 of bare melt under 10 cm, 0.05-0.2 under 0.5 m, below 0.1 under 1 m', () => {
    expect(debrisMeltFactor(0.1)).toBeGreaterThan(0.3);
    expect(debrisMeltFactor(0.1)).toBeLessThan(0.6);
    expect(debrisMeltFactor(0.5)).toBeGreaterThan(0.05);
    expect(debrisMeltFactor(0.5)).toBeLessThan(0.2);
    expect(debrisMeltFactor(1)).toBeLessThan(0.1);
  });
  it('never enhances melt (the fit leaves out the thin-debris peak of Østrem 1959): at most 1 and falling with thickness', () => {
    let previous = 1;
    for (const h of [0.001, 0.005, 0.01, 0.02, 0.05, 0.2, 1, 5]) {
      const f = debrisMeltFactor(h);
      expect(f).toBeLessThanOrEqual(previous);
      previous = f;
    }
  });
});

const valley: Scenario = {
  format: 'firnline-scenario',
  version: 1,
  name: 'Debris test valley (invented)',
  grid: { length: 16000, spacing: 100 },
  bed: [[0, 3100], [16000, 1500]],
  width: [[0, 800], [16000, 300]],
  ice: { n: 3, A: 2.4e-24 },
  massBalance: { model: 'linear', ela: 2850, ablationGradient: 0.007, maxAccumulation: 2 },
  spinup: true,
  run: { years: 200, outputEvery: 50 },
};

describe('debris in the model', () => {
  it('multiplies ablation by the factor and leaves accumulation alone (worked example, within 5e-13)', () => {
    const model = createFlowlineModel({ ...valley, debris: [[0, 0.066]] });
    const out = new Float64Array(model.grid.cellCount);
    const surface = new Float64Array(model.grid.cellCount).fill(2750);
    model.iceBalance(surface, 0, 1, out);
    expect(out[0] * model.iceToWaterEquivalent).toBeCloseTo(-0.7 * 0.5, 12);
    surface.fill(2950);
    model.iceBalance(surface, 0, 1, out);
    expect(out[0] * model.iceToWaterEquivalent).toBeCloseTo(0.7, 12);
  });

  it('a debris-covered tongue is longer at every output under +1.5 K, and longer at the end; the budget closes (<= 1e-9)', () => {
    const warming: Scenario['warming'] = [[0, 0], [50, 1.5]];
    const bare = runScenario({ ...valley, warming });
    const covered = runScenario({ ...valley, warming, debris: [[4000, 0], [5000, 0.02], [16000, 0.05]] });
    const first = (r: typeof bare) => r.frames[0].numbers.length;
    const last = (r: typeof bare) => r.frames[r.frames.length - 1].numbers.length;
    console.info('debris: length bare', first(bare), '->', last(bare), 'm; covered', first(covered), '->', last(covered), 'm');
    expect(first(covered)).toBeGreaterThan(first(bare));
    covered.frames.forEach((f, k) => expect(f.numbers.length).toBeGreaterThanOrEqual(bare.frames[k].numbers.length));
    expect(last(covered)).toBeGreaterThan(last(bare));
    expect(covered.summary.massBudget.relativeResidual).toBeLessThanOrEqual(1e-9);
    expect(Math.max(...covered.frames.map((f) => f.numbers.length))).toBeLessThan(15_000);
  });
});
