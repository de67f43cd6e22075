/**
 * Positive degree-days and snow fraction when the air temperature spreads normally, with standard
 * deviation sigma [K], about the sinusoidal annual cycle T(theta) = mu + a cos(theta) (the
 * day-to-day and within-month variability the plain sinusoid leaves out).
 *
 * Expected positive temperature for T ~ N(T_m, sigma^2) (Calov & Greve 2005, J. Glaciol. 51(172),
 * 173–175, their closed form; equation number from memory):
 *
 *   E[max(T, 0)] = sigma / sqrt(2 pi) exp(-T_m^2 / (2 sigma^2)) + (T_m / 2) erfc(-T_m / (sqrt(2) sigma))
 *
 * and the probability of snow, P(T < T_s) = (1/2) erfc((T_m - T_s) / (sqrt(2) sigma)). Both are
 * averaged over the annual cycle by the midpoint rule in `STEPS` equal parts of the year; for a
 * smooth periodic integrand that converges faster than any power of the step (the periodic
 * trapezoid/midpoint rule), and the tests compare it with an independent double integral.
 *
 * erfc by the Chebyshev fit "erfcc" of Press et al. (2007), Numerical Recipes, 3rd ed., section
 * 6.2 (fractional error below 1.2e-7 everywhere; coefficients as published there, from memory,
 * checked in the test against values of erfc computed independently by series).
 */
import { DAYS_PER_YEAR } from '../../units';

/** Parts of the year for the quadrature over the annual cycle (one a day). */
const STEPS = 365;

/** Complementary error function, fractional error < 1.2e-7 (Press et al. 2007, sec. 6.2). */
export function erfc(x: number): number {
  const z = Math.abs(x);
  const t = 2 / (2 + z);
  const ans =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t *
          (1.00002368 +
            t *
              (0.37409196 +
                t *
                  (0.09678418 +
                    t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return x >= 0 ? ans : 2 - ans;
}

/** E[max(T, 0)] [K] for T normal with mean `mean` [deg C] and standard deviation sigma [K] > 0. */
export function expectedPositiveTemperature(mean: number, sigma: number): number {
  return (sigma / Math.sqrt(2 * Math.PI)) * Math.exp(-(mean * mean) / (2 * sigma * sigma)) + (mean / 2) * erfc(-mean / (Math.SQRT2 * sigma));
}

/** Positive degree-days [K d] in one year: mean mu [deg C], half-range a [K], spread sigma [K] > 0. */
export function annualPositiveDegreeDaysWithSpread(mean: number, amplitude: number, sigma: number): number {
  let sum = 0;
  for (let k = 0; k < STEPS; k++) sum += expectedPositiveTemperature(mean + amplitude * Math.cos((2 * Math.PI * (k + 0.5)) / STEPS), sigma);
  return (sum / STEPS) * DAYS_PER_YEAR;
}

/** Expected fraction of the year [0..1] below `threshold` [deg C], spread sigma [K] > 0. */
export function fractionOfYearBelowWithSpread(threshold: number, mean: number, amplitude: number, sigma: number): number {
  let sum = 0;
  for (let k = 0; k < STEPS; k++) {
    const t = mean + amplitude * Math.cos((2 * Math.PI * (k + 0.5)) / STEPS);
    sum += 0.5 * erfc((t - threshold) / (Math.SQRT2 * sigma));
  }
  return sum / STEPS;
}
