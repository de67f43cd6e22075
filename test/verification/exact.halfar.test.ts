/**
 * Verification against the Halfar (1981) similarity solution, plane form (see exact/halfar.ts).
 * Flat bed, no balance, n = 3, A = 1e-16 Pa^-3 a^-1, rho = 910, half-profile with the divide at
 * the closed head of the valley (x = 0).
 */
import { describe, expect, it } from 'vitest';
import { deformationFluxCoefficient } from '../../src/model/physics/deformation';
import { FlowlineSimulation } from '../../src/model/simulation';
import { halfarMargin, halfarThickness, halfarTimeScale, type HalfarParameters } from './exact/halfar';
import { handBuiltModel, rms } from './helpers/handBuiltModel';
import type { SchemeName } from '../../src/model/flowlineModel';

const A_PER_YEAR = 1e-16;
const params: HalfarParameters = {
  n: 3,
  gamma: deformationFluxCoefficient(A_PER_YEAR, 3, 910, 9.81),
  divideThickness: 500,
  halfLength: 10_000,
};
const t0 = halfarTimeScale(params);
const tEnd = 4 * t0;
const DOMAIN = 13_000;

/** Interior error at tEnd, relative to the exact divide thickness, for grid spacing dx. */
/**
 * A convergence study in space needs the time error out of the way: the implicit (backward Euler,
 * first order in time) runs take steps of at most 0.05 a here; the explicit scheme's stability
 * limit is far shorter anyway.
 */
function halfarRun(spacing: number, scheme: SchemeName, maxStepYears = scheme === 'implicit' ? 0.05 : 1) {
  const model = handBuiltModel({
    scheme,
    maxStepYears,
    length: DOMAIN,
    spacing,
    rateFactorPerYear: A_PER_YEAR,
    initialThickness: (x) => halfarThickness(params, x, t0),
  });
  const simulation = new FlowlineSimulation(model, model.initialThickness, () => 0, t0);
  simulation.advanceTo(tEnd);
  const margin = halfarMargin(params, tEnd);
  const errors: number[] = [];
  model.grid.x.forEach((x, i) => {
    if (x < 0.9 * margin) errors.push(simulation.thickness[i] - halfarThickness(params, x, tEnd));
  });
  const divide = halfarThickness(params, 0, tEnd);
  return {
    rmsRelative: rms(errors) / divide,
    maxRelative: Math.max(...errors.map(Math.abs)) / divide,
    budget: simulation.massBudget(),
    thickness: simulation.thickness,
    spacing,
    margin,
  };
}

describe('Halfar (1981) plane similarity solution', () => {
  it('the formula satisfies dH/dt = d/dx(Gamma H^5 |H_x|^2 H_x) at t = 2 t0: finite-difference residual below 1e-4 |dH/dt| + 1e-9 at x = 1, 4, 7, 9 km', () => {
    const h = 1e-3;
    const dt = 1e-4;
    const t = 2 * t0;
    const flux = (x: number) => {
      const slope = (halfarThickness(params, x + h, t) - halfarThickness(params, x - h, t)) / (2 * h);
      return params.gamma * halfarThickness(params, x, t) ** 5 * Math.abs(slope) ** 2 * slope;
    };
    for (const x of [1000, 4000, 7000, 9000]) {
      const dHdt = (halfarThickness(params, x, t + dt) - halfarThickness(params, x, t - dt)) / (2 * dt);
      const dqdx = (flux(x + 1) - flux(x - 1)) / 2;
      expect(Math.abs(dHdt - dqdx)).toBeLessThan(1e-4 * Math.abs(dHdt) + 1e-9);
    }
  });

  // 1.495376 = (3/2) B(3/4, 10/7), B the beta function: 2 H0 L0 * integral_0^1 (1 - r^(4/3))^(3/7) dr
  // with u = r^(4/3). Derived here from the formula (n = 3), not a published number.
  it('the formula conserves volume: integral of H at t = 3 t0 is 1.495376 H0 L0 (derived: (3/2) B(3/4, 10/7)) within 5e-4 for the full profile', () => {
    let half = 0;
    const steps = 400000;
    const L = halfarMargin(params, 3 * t0);
    for (let k = 0; k < steps; k++) half += halfarThickness(params, ((k + 0.5) * L) / steps, 3 * t0) * (L / steps);
    expect((2 * half) / (params.divideThickness * params.halfLength)).toBeCloseTo(1.495376, 3);
  });

  it('implicit scheme with its default 1-a steps: interior (x < 0.9 L) RMS error at t = 4 t0 under 0.1 % of the divide thickness at dx = 100 m', () => {
    const relative = halfarRun(100, 'implicit', 1).rmsRelative;
    console.info(`Halfar (implicit, 1-a steps, dx 100 m): interior RMS error / H_divide ${relative.toExponential(3)}`);
    expect(relative).toBeLessThan(1e-3);
  });

  describe.each(['explicit', 'implicit'] as const)('%s scheme', (scheme) => {
    const runs = [400, 200, 100, 50].map((dx) => halfarRun(dx, scheme));

    it('Halfar (1981) interior profile (x < 0.9 L) at t = 4 t0, dx = 50 m: RMS error under 0.1 % and largest error under 1 % of the divide thickness', () => {
      const finest = runs[runs.length - 1];
      expect(finest.rmsRelative).toBeLessThan(1e-3);
      expect(finest.maxRelative).toBeLessThan(1e-2);
    });

    it('converges: the interior RMS error falls at each halving of dx (400, 200, 100, 50 m), mean observed order >= 0.8', () => {
      const orders: number[] = [];
      for (let k = 1; k < runs.length; k++) {
        expect(runs[k].rmsRelative).toBeLessThan(runs[k - 1].rmsRelative);
        orders.push(Math.log2(runs[k - 1].rmsRelative / runs[k].rmsRelative));
      }
      const meanOrder = Math.log2(runs[0].rmsRelative / runs[runs.length - 1].rmsRelative) / (runs.length - 1);
      console.info(
        `Halfar (${scheme}) interior RMS error / H_divide by dx:`,
        runs.map((r) => `${r.spacing} m: ${r.rmsRelative.toExponential(3)}`).join(', '),
        '| orders:', orders.map((o) => o.toFixed(2)).join(', '),
        '| mean order:', meanOrder.toFixed(2),
      );
      expect(meanOrder).toBeGreaterThanOrEqual(0.8);
    });

    it('conserves volume: no balance, outflow exactly 0, budget residual and volume change below 1e-12 relative at every dx', () => {
      for (const run of runs) {
        expect(run.budget.outflow).toBe(0);
        expect(run.budget.relativeResidual).toBeLessThan(1e-12);
        expect(Math.abs(run.budget.finalVolume / run.budget.initialVolume - 1)).toBeLessThan(1e-12);
      }
    });

    it('puts the margin (last cell with H >= 1 m) within two cells (100 m) of the exact L(4 t0) at dx = 50 m', () => {
      const finest = runs[runs.length - 1];
      let last = -1;
      finest.thickness.forEach((h, i) => {
        if (h >= 1) last = i;
      });
      const terminus = (last + 1) * finest.spacing;
      expect(Math.abs(terminus - finest.margin)).toBeLessThanOrEqual(2 * finest.spacing);
    });
  });
});
