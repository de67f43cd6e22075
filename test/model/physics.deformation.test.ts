import { describe, expect, it } from 'vitest';
import { deformationFluxCoefficient, deformationMeanSpeed, deformationSurfaceSpeed } from '../../src/model/physics/deformation';
import { drivingStress } from '../../src/model/physics/drivingStress';
import { nyeCrevasseDepth } from '../../src/model/physics/crevasseDepth';
import { slidingSpeed } from '../../src/model/physics/sliding';
import { SECONDS_PER_YEAR } from '../../src/model/units';

const A_TEMPERATE = 2.4e-24; // Pa^-3 s^-1, Cuffey & Paterson (2010) Table 3.4 at 0 C (from memory)

describe('driving stress and deformation speed (Paterson 1994; Cuffey & Paterson 2010, ch. 8)', () => {
  // Worked example, computed by hand from the two equations in the titles (not a published
  // number): rho 917, g 9.81, H 200 m, surface slope 3 degrees -> tau = 94.16 kPa; with
  // A = 2.4e-24 Pa^-3 s^-1, n = 3 and a 365.25-day year the surface speed is 6.32 m/a.
  const slope = Math.tan((3 * Math.PI) / 180);
  const sinSlope = Math.sin((3 * Math.PI) / 180);

  it('rho g H sin(alpha) gives 94.2 kPa (within 0.05 kPa) for 200 m of ice on a 3 degree slope', () => {
    expect(drivingStress(917, 9.81, 200, sinSlope) / 1000).toBeCloseTo(94.2, 1);
  });

  it('u_s = 2A/(n+1) tau^n H gives 6.3 m/a (within 0.05 m/a) for that column', () => {
    const tau = drivingStress(917, 9.81, 200, sinSlope);
    const u = deformationSurfaceSpeed(A_TEMPERATE * SECONDS_PER_YEAR, 3, tau, 200);
    expect(u).toBeCloseTo(6.3, 1);
  });

  it('the flux coefficient reproduces q = mean speed * H for plane flow (within 5e-9 m^2/a) and mean / surface speed = 4/5 (within 5e-13)', () => {
    const Apy = A_TEMPERATE * SECONDS_PER_YEAR;
    const H = 250;
    const gamma = deformationFluxCoefficient(Apy, 3, 910, 9.81);
    const tau = drivingStress(910, 9.81, H, slope);
    expect(gamma * H ** 5 * slope ** 3).toBeCloseTo(deformationMeanSpeed(Apy, 3, tau, H) * H, 8);
    // Depth-averaged speed is (n+1)/(n+2) of the surface speed for plane flow without sliding.
    expect(deformationMeanSpeed(Apy, 3, tau, H) / deformationSurfaceSpeed(Apy, 3, tau, H)).toBeCloseTo(4 / 5, 12);
  });
});

describe('Weertman sliding u_b = C tau_b^m (Weertman 1957)', () => {
  it('gives 10 m/a (within 5e-11) for C = 1e-14 m a^-1 Pa^-3 at 100 kPa', () => {
    expect(slidingSpeed(1e-14, 3, 1e5)).toBeCloseTo(10, 10);
  });
  it('is zero when C = 0', () => {
    expect(slidingSpeed(0, 3, 1e5)).toBe(0);
  });
});

// Worked by hand from Nye's (1957) d = (2/(rho g)) (rate/A)^(1/n) with rho 917, g 9.81,
// A 2.4e-24 Pa^-3 s^-1, n 3 and a 365.25-day year: 19.36 m and 24.39 m, rounded to 0.1 m
// (not published numbers).
const crevasseDepthWorked: Array<[number, number]> = [
  [0.05, 19.4],
  [0.1, 24.4],
];

describe('nyeCrevasseDepth (Nye 1957)', () => {
  it.each(crevasseDepthWorked)('A = 2.4e-24, strain rate %f a^-1 -> %f m (within 0.05 m)', (rate, depth) => {
    const d = nyeCrevasseDepth(rate / SECONDS_PER_YEAR, A_TEMPERATE, 3, 917, 9.81);
    expect(d).toBeCloseTo(depth, 1);
  });
  it('is zero in compression', () => {
    expect(nyeCrevasseDepth(-0.05 / SECONDS_PER_YEAR, A_TEMPERATE, 3, 917, 9.81)).toBe(0);
  });
  it('at a strain rate of 0.08 a^-1 lies between 20 and 30 m, the depths observed on temperate glaciers (Holdsworth 1969)', () => {
    const d = nyeCrevasseDepth(0.08 / SECONDS_PER_YEAR, A_TEMPERATE, 3, 917, 9.81);
    expect(d).toBeGreaterThan(20);
    expect(d).toBeLessThan(30);
  });
});
