/**
 * Misfit of a modelled field (thickness or surface speed) against point observations at one model
 * year: residual r_i = modelled(x_i) - observed_i, with the modelled value interpolated linearly
 * between cell centres (held at the end cells' values out to the domain's edges).
 *
 *   bias         = (1/N) sum r_i                                   [unit of the field]
 *   RMS          = sqrt((1/N) sum r_i^2)                           [unit of the field]
 *   weighted RMS = sqrt(sum w_i r_i^2 / sum w_i),  w_i = 1/sigma_i^2 [unit of the field]
 *   normalised   = sqrt((1/N) sum (r_i/sigma_i)^2)                 [-]; about 1 when the model fits
 *                  within the stated uncertainties (the reduced chi-square's square root, with no
 *                  parameters counted: standard least-squares practice)
 *
 * Observations outside the domain [0, length] are left out and counted; observations with an
 * uncertainty that is not positive count in the bias and RMS but not in the weighted figures.
 * Pure: no DOM, no allocation beyond the result.
 */
import type { ObservedPoint } from '../scenario';

export interface Misfit {
  /** Observations compared (inside the domain). */
  count: number;
  /** Observations left out because they lie outside the domain. */
  outside: number;
  /** Mean of modelled - observed. */
  bias: number;
  /** Root mean square of modelled - observed. */
  rms: number;
  /** RMS weighted by 1/uncertainty^2; NaN when no observation has a positive uncertainty. */
  weightedRms: number;
  /** RMS of residual/uncertainty [-]; NaN when no observation has a positive uncertainty. */
  normalisedRms: number;
}

/** The modelled value at x [m], linear between cell centres `x` (increasing), held beyond them. */
export function interpolateAt(x: ArrayLike<number>, values: ArrayLike<number>, at: number): number {
  const n = x.length;
  if (n === 0) return NaN;
  if (at <= x[0]) return values[0];
  if (at >= x[n - 1]) return values[n - 1];
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= at) lo = mid;
    else hi = mid;
  }
  const t = (at - x[lo]) / (x[hi] - x[lo]);
  return values[lo] + t * (values[hi] - values[lo]);
}

/**
 * Misfit of `values` (at cell centres `x` [m], over a domain of `lengthM` m) against `observed`
 * [x m, value, uncertainty]; null when no observation lies in the domain.
 */
export function observationMisfit(
  x: ArrayLike<number>,
  values: ArrayLike<number>,
  lengthM: number,
  observed: readonly ObservedPoint[],
): Misfit | null {
  let count = 0;
  let outside = 0;
  let sum = 0;
  let sumSq = 0;
  let weighted = 0;
  let weights = 0;
  let normalised = 0;
  let withSigma = 0;
  for (const [xo, value, sigma] of observed) {
    if (!(xo >= 0 && xo <= lengthM)) {
      outside++;
      continue;
    }
    const r = interpolateAt(x, values, xo) - value;
    count++;
    sum += r;
    sumSq += r * r;
    if (sigma > 0) {
      const w = 1 / (sigma * sigma);
      weighted += w * r * r;
      weights += w;
      normalised += (r * r) * w;
      withSigma++;
    }
  }
  if (count === 0) return null;
  return {
    count,
    outside,
    bias: sum / count,
    rms: Math.sqrt(sumSq / count),
    weightedRms: withSigma ? Math.sqrt(weighted / weights) : NaN,
    normalisedRms: withSigma ? Math.sqrt(normalised / withSigma) : NaN,
  };
}
