/**
 * The forcing series (model/climate.ts): [year, warming K, precipitation factor] replacing the
 * warming. Checks are worked by hand or against the warming path it must reproduce; the budget
 * check is the finite-volume conservation of test/verification/massBudget.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { climateSeries, withClimateHeldAt } from '../../src/model/climate';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { straightValley } from '../helpers/testValleys';

const valley: Scenario = straightValley('Forcing test valley (invented)', { years: 150, outputEvery: 50 });

describe('climateSeries', () => {
  it('interpolates both columns linearly and holds the ends (hand-worked, within 5e-13)', () => {
    const c = climateSeries({ forcing: [[0, 0, 1], [100, 2, 1.2]] });
    expect(c.warmingAt(50)).toBeCloseTo(1, 12);
    expect(c.precipitationFactorAt(50)).toBeCloseTo(1.1, 12);
    expect(c.warmingAt(500)).toBe(2);
    expect(c.precipitationFactorAt(-10)).toBe(1);
  });
  it('without a forcing: the warming, and a factor of exactly 1', () => {
    const c = climateSeries({ warming: [[0, 0], [10, 1]] });
    expect(c.warmingAt(5)).toBe(0.5);
    expect(c.precipitationFactorAt(5)).toBe(1);
  });
  it('holds a forcing as a one-row forcing and a warming as a one-point warming', () => {
    expect(withClimateHeldAt({ forcing: [[0, 0, 1], [100, 2, 1.2]] }, 50).forcing).toEqual([[0, 1, 1.1]]);
    expect(withClimateHeldAt({ warming: [[0, 0], [100, 2]] }, 50).warming).toEqual([[0, 1]]);
  });
});

describe('forcing in a run', () => {
  it('a forcing with factor 1 reproduces the same warming given as "warming" bit for bit', () => {
    const byWarming = runScenario({ ...valley, warming: [[0, 0], [100, 1.5]] });
    const byForcing = runScenario({ ...valley, forcing: [[0, 0, 1], [100, 1.5, 1]] });
    const last = (r: typeof byWarming) => r.frames[r.frames.length - 1].fields.thickness;
    expect(Array.from(last(byForcing))).toEqual(Array.from(last(byWarming)));
  });

  it('worked example: the model balance above the ELA is the accumulation times the factor (1.3 x 0.7 m w.e. at 100 m above, within 5e-13)', () => {
    const model = createFlowlineModel({ ...valley, forcing: [[0, 0, 1.3]] });
    const out = new Float64Array(1);
    model.iceBalance(Float64Array.of(2900), 0, model.precipitationFactorAt(0), out);
    expect(out[0] * model.iceToWaterEquivalent).toBeCloseTo(0.7 * 1.3, 12);
    model.iceBalance(Float64Array.of(2700), 0, model.precipitationFactorAt(0), out);
    expect(out[0] * model.iceToWaterEquivalent).toBeCloseTo(-0.7, 12);
  });

  it('20 % more precipitation from year 0 makes the steady glacier grow, 20 % less shrink (direction), and the budget closes (<= 1e-9)', () => {
    const volumeAtEnd = (factor: number) => {
      const report = runScenario({ ...valley, forcing: [[0, 0, 1], [1, 0, factor]] });
      expect(report.summary.massBudget.relativeResidual).toBeLessThanOrEqual(1e-9);
      return report.summary.massBudget.finalVolume;
    };
    const wet = volumeAtEnd(1.2);
    const same = volumeAtEnd(1);
    const dry = volumeAtEnd(0.8);
    console.info('forcing: final volume for P x0.8 / x1 / x1.2 [m^3]', dry.toExponential(4), same.toExponential(4), wet.toExponential(4));
    expect(wet).toBeGreaterThan(same * 1.02);
    expect(dry).toBeLessThan(same * 0.98);
  });
});
