/**
 * Ice over a bedrock step: the exact steady solution after Jarosch, Schoof & Anslow (2013), see
 * exact/bedrockStep.ts. The paper's point is that many shallow-ice schemes lose or create mass at
 * such a cliff; here the budget must close (relative residual below 1e-9) and thickness must never be negative,
 * and the steady profile must approach the exact one.
 */
import { describe, expect, it } from 'vitest';
import { deformationFluxCoefficient } from '../../src/model/physics/deformation';
import { FlowlineSimulation } from '../../src/model/simulation';
import { endsInSteadyState } from '../../src/model/steadyState';
import { stepBalance, stepThickness, type StepParameters } from './exact/bedrockStep';
import { handBuiltModel } from './helpers/handBuiltModel';
import type { SchemeName } from '../../src/model/flowlineModel';

const A_PER_YEAR = 1e-16;
const step: StepParameters = {
  n: 3,
  gamma: deformationFluxCoefficient(A_PER_YEAR, 3, 910, 9.81),
  marginPosition: 20_000,
  stepPosition: 7_000,
  stepHeight: 500,
};

function stepModel(spacing: number, scheme: SchemeName, startFromExact = false) {
  return handBuiltModel({
    scheme,
    initialThickness: startFromExact ? (x) => stepThickness(step, x) : undefined,
    length: 25_000,
    spacing,
    rateFactorPerYear: A_PER_YEAR,
    bed: (x) => (x < step.stepPosition ? step.stepHeight : 0),
    balance: (x) => stepBalance(step, x),
  });
}

describe('bedrock step (Jarosch, Schoof & Anslow 2013)', () => {
  it('the exact profile: H < 1 m just above the cliff edge, 300 m < H < 500 m (the cliff height) just below it', () => {
    const up = stepThickness(step, step.stepPosition - 1e-6);
    const down = stepThickness(step, step.stepPosition + 1e-6);
    expect(up).toBeLessThan(1);
    expect(down).toBeGreaterThan(300);
    expect(down).toBeLessThan(step.stepHeight);
  });

  describe.each(['explicit', 'implicit'] as const)('%s scheme', (scheme) => {
    it('growing from ice-free for 3,000 a at dx = 100 m: thickness never negative (checked every 50 a), budget residual and clipped round-off below 1e-9 relative', () => {
      const model = stepModel(100, scheme);
      const simulation = new FlowlineSimulation(model, model.initialThickness);
      let smallest = 0;
      for (let year = 50; year <= 3000; year += 50) {
        simulation.advanceTo(year);
        smallest = Math.min(smallest, ...simulation.thickness);
      }
      expect(smallest).toBeGreaterThanOrEqual(0);
      const budget = simulation.massBudget();
      expect(budget.relativeResidual).toBeLessThan(1e-9);
      expect(budget.clippedRoundOff).toBeLessThan(1e-9 * budget.finalVolume);
    });

    // Growing the full glacier from ice-free takes some 30,000 model years (the balance is small), so
    // the steady tests start from the exact profile, run 5,000 years and compare.
    function settled(spacing: number) {
      const model = stepModel(spacing, scheme, true);
      const simulation = new FlowlineSimulation(model, model.initialThickness);
      simulation.advanceTo(5000);
      const errorIn = (from: number, to: number) => {
        let worst = 0;
        model.grid.x.forEach((x, i) => {
          if (x > from && x < to) {
            const exact = stepThickness(step, x);
            worst = Math.max(worst, Math.abs(simulation.thickness[i] - exact) / exact);
          }
        });
        return worst;
      };
      return {
        // Away from the cliff edge (where the upper ice thins to zero, like a margin) and the margin.
        away: Math.max(errorIn(0, 5000), errorIn(7000, 16000)),
        // 1-2 km above the cliff edge. The last kilometre, where H -> 0 with an infinite surface
        // slope, converges much more slowly and is reported, not tested.
        aboveCliff: errorIn(5000, 6000),
        lastKilometre: errorIn(6000, 6950),
        steady: endsInSteadyState(simulation.annual, spacing),
        budget: simulation.massBudget(),
      };
    }
    const coarse = settled(200);
    const fine = settled(100);

    it('Jarosch, Schoof & Anslow (2013) step, from the exact profile, steady after 5,000 a: worst relative error below 2.5 % at dx = 100 m (x < 5 km and 7-16 km), and below 0.7 times that at dx = 200 m', () => {
      const pct = (v: number) => `${(v * 100).toFixed(2)} %`;
      console.info(
        `bedrock step (${scheme}), worst relative thickness error (dx 200 / 100 m): away ${pct(coarse.away)} / ${pct(fine.away)},` +
          ` 1-2 km above the cliff ${pct(coarse.aboveCliff)} / ${pct(fine.aboveCliff)},` +
          ` last km above the cliff ${pct(coarse.lastKilometre)} / ${pct(fine.lastKilometre)}`,
      );
      expect(coarse.steady).toBe(true);
      expect(fine.steady).toBe(true);
      expect(fine.away).toBeLessThan(0.025);
      expect(fine.away).toBeLessThan(0.7 * coarse.away);
    });

    it('1-2 km above the cliff edge (x = 5-6 km): worst relative error below 5 % at dx = 100 m, and below 0.7 times that at dx = 200 m', () => {
      expect(fine.aboveCliff).toBeLessThan(0.05);
      expect(fine.aboveCliff).toBeLessThan(0.7 * coarse.aboveCliff);
    });

    it('conserves mass across the cliff: budget residual below 1e-9 relative at dx = 200 and 100 m', () => {
      expect(coarse.budget.relativeResidual).toBeLessThan(1e-9);
      expect(fine.budget.relativeResidual).toBeLessThan(1e-9);
    });
  });
});
