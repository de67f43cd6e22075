/**
 * Annual positive degree-days and snow fraction for a sinusoidal annual temperature cycle
 * T(theta) = mu + a cos(theta), theta uniform over the year, integrated in closed form.
 *
 *   PDD = (D / pi) * (mu * theta0 + a * sin(theta0)),   theta0 = arccos(clamp(-mu / a, -1, 1))
 *   fraction of the year with T < Ts = 1 - arccos(clamp((Ts - mu) / a, -1, 1)) / pi
 *
 * D = 365.25 d. The closed form is the exact integral of max(T, 0) over one cycle (no daily noise,
 * as in the "sinusoidal year" degree-day models reviewed by Hock 2003, J. Hydrol. 282).
 */
import { DAYS_PER_YEAR } from '../../units';

/** Positive degree-days [K d] in one year for mean mu [deg C] and half-range a [K]. */
export function annualPositiveDegreeDays(mean: number, amplitude: number): number {
  if (amplitude <= 0) return DAYS_PER_YEAR * Math.max(mean, 0);
  const theta0 = Math.acos(clamp(-mean / amplitude));
  return (DAYS_PER_YEAR / Math.PI) * (mean * theta0 + amplitude * Math.sin(theta0));
}

/** Fraction of the year [0..1] when the temperature is below `threshold` [deg C]. */
export function fractionOfYearBelow(threshold: number, mean: number, amplitude: number): number {
  if (amplitude <= 0) return mean < threshold ? 1 : 0;
  return 1 - Math.acos(clamp((threshold - mean) / amplitude)) / Math.PI;
}

function clamp(value: number): number {
  return Math.min(1, Math.max(-1, value));
}
