/**
 * Ice surface of a perfectly plastic glacier (Nye 1952, J. Glaciol. 2(12)): the basal shear
 * stress equals the yield stress tau0 everywhere, so rho g H |ds/dx| = tau0 with H = s - b.
 * Integrated from the terminus (H = 0) up-valley, distance d = x_terminus - x:
 *
 *   ds/dd = tau0 / (rho g H),
 *
 * singular at the margin; written for u = H^2 it is regular there:
 *
 *   du/dd = 2 tau0 / (rho g) - 2 sqrt(u) db/dd,
 *
 * and on a flat bed gives the closed form H = sqrt(2 tau0 d / (rho g)). Integrated with RK4.
 * Where a steep bed rise would make u negative the ice thins to zero (u held at 0).
 */
import { piecewiseLinear } from '../../../model/piecewiseLinear';
import type { Point } from '../../../model/scenario';
import { GRAVITY } from '../../../model/units';
import { simplifyProfile } from '../../../chart/simplifyProfile';

/** Default yield stress [Pa]: 100 kPa (Nye 1952; common practice for valley glaciers). */
export const DEFAULT_YIELD_STRESS = 100_000;

export interface PlasticProfileInput {
  bed: readonly Point[];
  /** Domain length [m]. */
  lengthM: number;
  /** Terminus position [m from the head]; downstream of it the surface lies on the bed. */
  terminusM: number;
  /** Yield stress tau0 [Pa]. */
  yieldStress: number;
  /** Ice density [kg m^-3]. */
  density: number;
  /** Integration step [m]. */
  stepM?: number;
  /** Simplification tolerance of the returned point list [m of elevation]. */
  toleranceM?: number;
}

/** Thickness H [m] at distance d up-valley of the terminus, integrated with RK4 in u = H^2. */
export function plasticThickness(
  bedAt: (x: number) => number,
  terminusM: number,
  distances: readonly number[],
  yieldStress: number,
  density: number,
): number[] {
  const k = (2 * yieldStress) / (density * GRAVITY);
  const slopeStep = 0.5;
  // db/dd by a central difference of the piecewise-linear bed (d increases up-valley).
  const dbdd = (d: number) => (bedAt(terminusM - d - slopeStep) - bedAt(terminusM - d + slopeStep)) / (2 * slopeStep);
  const rate = (d: number, u: number) => k - 2 * Math.sqrt(Math.max(0, u)) * dbdd(d);
  const out: number[] = [];
  let u = 0;
  let d = 0;
  for (const target of distances) {
    while (d < target) {
      const h = Math.min(target - d, 10);
      const k1 = rate(d, u);
      const k2 = rate(d + h / 2, Math.max(0, u + (h / 2) * k1));
      const k3 = rate(d + h / 2, Math.max(0, u + (h / 2) * k2));
      const k4 = rate(d + h, Math.max(0, u + h * k3));
      u = Math.max(0, u + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4));
      d += h;
    }
    out.push(Math.sqrt(u));
  }
  return out;
}

/** Surface point list [x m, z m a.s.l.] of the plastic glacier ending at `terminusM`. */
export function plasticProfile(input: PlasticProfileInput): Point[] {
  const { bed, lengthM, yieldStress, density } = input;
  const terminus = Math.min(lengthM, Math.max(0, input.terminusM));
  const step = input.stepM ?? Math.max(5, lengthM / 2000);
  const bedAt = piecewiseLinear(bed);
  const xs: number[] = [];
  for (let x = terminus; x > 0; x -= step) xs.push(x);
  xs.push(0);
  const thickness = plasticThickness(
    bedAt,
    terminus,
    xs.map((x) => terminus - x),
    yieldStress,
    density,
  );
  const ice: Point[] = xs.map((x, i) => [x, bedAt(x) + thickness[i]] as Point).reverse();
  // Down-valley of the terminus the surface follows the bed: no ice there.
  const below: Point[] = bed.filter(([x]) => x > terminus && x <= lengthM).map(([x, z]) => [x, z]);
  if (terminus < lengthM && (below.length === 0 || below[below.length - 1][0] < lengthM)) below.push([lengthM, bedAt(lengthM)]);
  return simplifyProfile([...ice, ...below], input.toleranceM ?? 1);
}
