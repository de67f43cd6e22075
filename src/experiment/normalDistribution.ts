/**
 * The standard normal distribution: its CDF Phi and its quantile (inverse CDF).
 *
 * CDF: Phi(x) = erfc(-x / sqrt 2) / 2, with erf by its Maclaurin series for |z| < 3
 * (Abramowitz & Stegun 1964, eq. 7.1.5) and erfc by its continued fraction for |z| >= 3
 * (A&S eq. 7.1.14, evaluated by Lentz's method); both converge to double precision there.
 *
 * Quantile: P. J. Acklam's rational approximation (2003, "An algorithm for computing the inverse
 * normal cumulative distribution function", published on his web page; relative error below
 * 1.15e-9), followed by one step of Halley's method on Phi(x) - p with the CDF above, which takes
 * it to about 1e-15. The coefficients are as published by Acklam, written here from memory;
 * the tests check the result against table values of the normal quantile (A&S Table 26.5 /
 * common statistical tables), which any wrong coefficient would fail.
 */

const SQRT2 = Math.SQRT2;
const SQRT2PI = Math.sqrt(2 * Math.PI);

function erfSeries(z: number): number {
  // erf z = 2/sqrt(pi) * sum (-1)^n z^(2n+1) / (n! (2n+1))
  let term = z;
  let sum = z;
  const z2 = z * z;
  for (let n = 1; n < 200; n++) {
    term *= -z2 / n;
    const add = term / (2 * n + 1);
    sum += add;
    if (Math.abs(add) < 1e-17 * Math.abs(sum)) break;
  }
  return (2 / Math.sqrt(Math.PI)) * sum;
}

/** erfc z for z >= 3 by the continued fraction erfc z = exp(-z^2)/sqrt(pi) * 1/(z + 1/2/(z + 1/(z + 3/2/(z + ...)))). */
function erfcContinuedFraction(z: number): number {
  // Lentz's method on f = z + a1/(z + a2/(z + ...)), a_k = k/2.
  const tiny = 1e-300;
  let f = z;
  let c = z;
  let d = 0;
  for (let k = 1; k < 500; k++) {
    const a = k / 2;
    d = z + a * d;
    d = d === 0 ? tiny : d;
    c = z + a / c;
    c = c === 0 ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return Math.exp(-z * z) / Math.sqrt(Math.PI) / f;
}

function erfc(z: number): number {
  if (z >= 3) return erfcContinuedFraction(z);
  if (z <= -3) return 2 - erfcContinuedFraction(-z);
  return 1 - erfSeries(z);
}

/** Phi(x), the standard normal CDF. */
export function normalCdf(x: number): number {
  if (Number.isNaN(x)) return Number.NaN;
  if (x === Number.POSITIVE_INFINITY) return 1;
  if (x === Number.NEGATIVE_INFINITY) return 0;
  return 0.5 * erfc(-x / SQRT2);
}

const A = [-3.969683028665376e1, 2.209460984245205e2, -2.759285104469687e2, 1.38357751867269e2, -3.066479806614716e1, 2.506628277459239];
const B = [-5.447609879822406e1, 1.615858368580409e2, -1.556989798598866e2, 6.680131188771972e1, -1.328068155288572e1];
const C = [-7.784894002430293e-3, -3.223964580411365e-1, -2.400758277161838, -2.549732539343734, 4.374664141464968, 2.938163982698783];
const D = [7.784695709041462e-3, 3.224671290700398e-1, 2.445134137142996, 3.754408661907416];
const P_LOW = 0.02425;

function acklam(p: number): number {
  if (p < P_LOW) {
    const q = Math.sqrt(-2 * Math.log(p));
    return (((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  if (p > 1 - P_LOW) {
    const q = Math.sqrt(-2 * Math.log(1 - p));
    return -(((((C[0] * q + C[1]) * q + C[2]) * q + C[3]) * q + C[4]) * q + C[5]) / ((((D[0] * q + D[1]) * q + D[2]) * q + D[3]) * q + 1);
  }
  const q = p - 0.5;
  const r = q * q;
  return ((((((A[0] * r + A[1]) * r + A[2]) * r + A[3]) * r + A[4]) * r + A[5]) * q) / (((((B[0] * r + B[1]) * r + B[2]) * r + B[3]) * r + B[4]) * r + 1);
}

/** Phi^-1(p) for 0 < p < 1; -Infinity at 0, +Infinity at 1, NaN outside. */
export function normalQuantile(p: number): number {
  if (!(p >= 0 && p <= 1)) return Number.NaN;
  if (p === 0) return Number.NEGATIVE_INFINITY;
  if (p === 1) return Number.POSITIVE_INFINITY;
  const x = acklam(p);
  // One Halley step (Acklam's refinement): e = Phi(x) - p, u = e sqrt(2 pi) exp(x^2/2).
  const e = normalCdf(x) - p;
  const u = e * SQRT2PI * Math.exp((x * x) / 2);
  const refined = x - u / (1 + (x * u) / 2);
  return Number.isFinite(refined) ? refined : x;
}
