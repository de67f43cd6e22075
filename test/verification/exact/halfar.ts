/**
 * Halfar (1981, On the dynamics of the ice sheets, J. Geophys. Res. 86(C11), 11065-11072)
 * similarity solution of the shallow-ice equation on a flat bed with no balance, plane (flowline)
 * form. Written here in our notation and checked independently rather than copied: the exponent
 * a = 1/(3n+2) follows from the scaling H ~ t^-a, x ~ t^a (volume conserved) in
 * dH/dt = d/dx(Gamma H^(n+2) |H_x|^(n-1) H_x), and exact.halfar.test.ts checks that the formula
 * satisfies that equation by finite differences:
 *
 *   H(x,t) = H0 (t0/t)^a [1 - ((t0/t)^a |x| / L0)^((n+1)/n)]^(n/(2n+1)),   a = 1/(3n+2)
 *   t0 = (a / Gamma) ((2n+1)/(n+1))^n L0^(n+1) / H0^(2n+1),   Gamma = 2A (rho g)^n / (n+2)
 *
 * At t = t0 the profile has divide thickness H0 and half-length L0.
 */
export interface HalfarParameters {
  n: number;
  /** Gamma [m^-n a^-1]. */
  gamma: number;
  divideThickness: number;
  halfLength: number;
}

export function halfarExponent(n: number): number {
  return 1 / (3 * n + 2);
}

export function halfarTimeScale(p: HalfarParameters): number {
  const a = halfarExponent(p.n);
  return (a / p.gamma) * ((2 * p.n + 1) / (p.n + 1)) ** p.n * p.halfLength ** (p.n + 1) / p.divideThickness ** (2 * p.n + 1);
}

export function halfarThickness(p: HalfarParameters, x: number, t: number): number {
  const a = halfarExponent(p.n);
  const shrink = (halfarTimeScale(p) / t) ** a;
  const r = (shrink * Math.abs(x)) / p.halfLength;
  if (r >= 1) return 0;
  return p.divideThickness * shrink * (1 - r ** ((p.n + 1) / p.n)) ** (p.n / (2 * p.n + 1));
}

/** Margin position L(t) = L0 (t/t0)^a [m]. */
export function halfarMargin(p: HalfarParameters, t: number): number {
  return p.halfLength * (t / halfarTimeScale(p)) ** halfarExponent(p.n);
}
