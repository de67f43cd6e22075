import { describe, expect, it } from 'vitest';
import { plasticProfile, plasticThickness } from '../../../src/ui/edit/geometry/plasticProfile';
import { piecewiseLinear } from '../../../src/model/piecewiseLinear';
import { GRAVITY } from '../../../src/model/units';

const TAU = 100_000;
const RHO = 910;

describe('plastic ice profile (Nye 1952)', () => {
  it('matches the flat-bed closed form H = sqrt(2 tau0 d / (rho g)) from the margin', () => {
    const distances = [10, 100, 1000, 5000];
    const H = plasticThickness(() => 0, 10_000, distances, TAU, RHO);
    distances.forEach((d, i) => {
      const exact = Math.sqrt((2 * TAU * d) / (RHO * GRAVITY));
      console.info(`flat bed d = ${d} m: H = ${H[i].toFixed(3)} m, closed form ${exact.toFixed(3)} m`);
      expect(H[i]).toBeCloseTo(exact, 6);
    });
  });

  it('tends to H = tau0 / (rho g beta) far up a bed of constant slope beta (ds/dx = db/dx there)', () => {
    const beta = 0.1;
    // Bed rising up-valley at 10 %: b(x) = beta (L - x).
    const L = 40_000;
    const bedAt = (x: number) => beta * (L - x);
    const [H] = plasticThickness(bedAt, L, [30_000], TAU, RHO);
    const limit = TAU / (RHO * GRAVITY * beta);
    console.info(`sloping bed: H(30 km) = ${H.toFixed(2)} m, asymptote ${limit.toFixed(2)} m`);
    expect(Math.abs(H - limit) / limit).toBeLessThan(0.01);
  });

  it('gives a surface whose basal stress rho g H |ds/dx| is the yield stress on the demo-like bed', () => {
    const bed: [number, number][] = [[0, 3350], [2500, 2800], [5900, 2410], [6600, 2470], [8000, 2400], [12000, 1950]];
    const surface = plasticProfile({ bed, lengthM: 12_000, terminusM: 9000, yieldStress: TAU, density: RHO, toleranceM: 0.01, stepM: 5 });
    const s = piecewiseLinear(surface);
    const b = piecewiseLinear(bed);
    for (const x of [1000, 3000, 5000, 7000, 8500]) {
      const H = s(x) - b(x);
      const slope = (s(x - 20) - s(x + 20)) / 40;
      const tau = RHO * GRAVITY * H * slope;
      expect(Math.abs(tau - TAU) / TAU, `x = ${x}`).toBeLessThan(0.03);
    }
    // Down-valley of the terminus the surface lies on the bed: no ice.
    expect(s(10_000)).toBeCloseTo(b(10_000), 6);
    expect(s(9000)).toBeCloseTo(b(9000), 6);
  });
});
