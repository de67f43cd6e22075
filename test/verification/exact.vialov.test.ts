/**
 * Vialov (1958) steady profile on a flat bed with uniform accumulation a, divide at x = 0 and the
 * ice leaving at x = L. Source: Vialov, S. S. (1958), Regularities of glacial shields movement and
 * the theory of plastic viscous flow, IASH Publ. 47, 266-275 (bibliographic details and the form
 * of the formula from memory). The formula is not taken on trust but re-derived here: the steady
 * flux Gamma H^(n+2) |H'|^n = a x integrates, with H(L) = 0, to the form below, and the first
 * test checks it by finite differences:
 *
 *   H(x) = H0 [1 - (x/L)^((n+1)/n)]^(n/(2n+2)),   H0^(2n+2) = 2^n (a / Gamma) L^(n+1)
 */
import { describe, expect, it } from 'vitest';
import { deformationFluxCoefficient } from '../../src/model/physics/deformation';
import { spinUp } from '../../src/model/spinUp';
import { handBuiltModel } from './helpers/handBuiltModel';
import type { SchemeName } from '../../src/model/flowlineModel';

const A_PER_YEAR = 1e-16;
const n = 3;
const gamma = deformationFluxCoefficient(A_PER_YEAR, n, 910, 9.81);
const accumulation = 0.3; // m ice a^-1
const L = 20_000;
const H0 = (2 ** n * (accumulation / gamma) * L ** (n + 1)) ** (1 / (2 * n + 2));
const vialov = (x: number) => H0 * (1 - (x / L) ** ((n + 1) / n)) ** (n / (2 * n + 2));

function steadyError(spacing: number, scheme: SchemeName) {
  const model = handBuiltModel({ scheme, length: L, spacing, rateFactorPerYear: A_PER_YEAR, balance: () => accumulation });
  const result = spinUp(model, model.initialThickness, { maxYears: 50_000 });
  let worst = 0;
  model.grid.x.forEach((x, i) => {
    if (x < 0.8 * L) worst = Math.max(worst, Math.abs(result.thickness[i] - vialov(x)) / vialov(x));
  });
  return { worst, converged: result.converged, years: result.years };
}

describe('Vialov (1958) steady profile', () => {
  it('the formula satisfies the steady flux balance Gamma H^5 |H\'|^3 = a x: finite-difference flux within 5e-5 m^2/a at x = 2, 8, 14, 18 km', () => {
    for (const x of [2000, 8000, 14000, 18000]) {
      const h = 0.01;
      const slope = (vialov(x + h) - vialov(x - h)) / (2 * h);
      expect(gamma * vialov(x) ** 5 * Math.abs(slope) ** 3).toBeCloseTo(accumulation * x, 4);
    }
  });

  describe.each(['explicit', 'implicit'] as const)('%s scheme', (scheme) => {
    const runs = [400, 200, 100].map((dx) => ({ dx, ...steadyError(dx, scheme) }));

    it('Vialov (1958) steady profile grown from ice-free (steady at dx = 400, 200, 100 m): worst relative error below 0.5 % for x < 0.8 L at dx = 100 m', () => {
      console.info(`Vialov (${scheme}) worst relative error (x < 0.8 L):`, runs.map((r) => `${r.dx} m: ${(r.worst * 100).toFixed(2)} % after ${r.years} a`).join(', '));
      for (const run of runs) expect(run.converged).toBe(true);
      expect(runs[2].worst).toBeLessThan(0.005);
    });

    it('the worst relative error (x < 0.8 L) falls at each refinement, dx = 400, 200, 100 m', () => {
      expect(runs[1].worst).toBeLessThan(runs[0].worst);
      expect(runs[2].worst).toBeLessThan(runs[1].worst);
    });
  });
});
