/**
 * Crevasse depth where the ice is extending (Nye 1957, Proc. R. Soc. A 239):
 *
 *   d = (2 / (rho g)) * (strainRate / A)^(1/n)
 *
 * i.e. the depth at which the overburden closes a crevasse opened by the longitudinal tensile
 * stress of a plane, extending flow. Good to about a factor of two; observed depths on temperate
 * glaciers are mostly 20-30 m (Holdsworth 1969).
 */

/**
 * Crevasse depth [m] for longitudinal strain rate `strainRatePerSecond` [s^-1], rate factor
 * `rateFactor` [Pa^-n s^-1], exponent n, density [kg m^-3], gravity [m s^-2].
 * Zero where the ice is compressing or not deforming.
 */
export function nyeCrevasseDepth(
  strainRatePerSecond: number,
  rateFactor: number,
  n: number,
  density: number,
  gravity: number,
): number {
  if (!(strainRatePerSecond > 0)) return 0;
  return (2 / (density * gravity)) * Math.pow(strainRatePerSecond / rateFactor, 1 / n);
}
