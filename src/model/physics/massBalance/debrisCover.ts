/**
 * Melt under a debris cover of thickness h_d [m], as a factor on the debris-free ablation:
 *
 *   f(h_d) = h* / (h* + h_d),     h* = 0.066 m
 *
 * the hyperbolic fit to Østrem-type measurements of melt against debris thickness used by
 * Anderson & Anderson (2016), The Cryosphere 10, 1105–1124 ("Modeling debris-covered glaciers:
 * response to steady debris deposition"; the form and h* = 6.6 cm from memory). It falls
 * monotonically: half the bare-ice melt under 6.6 cm, about a tenth under 0.6 m. It leaves out
 * the rise of melt under a few millimetres to ~2 cm of debris that Østrem (1959, Geogr. Ann. 41)
 * measured: thin debris does NOT enhance melt here, and for covers thinner than ~2 cm the model
 * underestimates melt (by up to ~30–50 % at ~1 cm in Østrem's curve; from memory).
 *
 * Only ablation is reduced: the balance is multiplied by f where it is negative and left alone
 * where positive (snow accumulates on debris as on ice). In the degree-day model a negative
 * annual balance is the ice melt after the year's snow has gone, so f acts on ice melt alone.
 */

/** Characteristic debris thickness h* [m] of the fit (Anderson & Anderson 2016; from memory). */
export const DEBRIS_CHARACTERISTIC_THICKNESS = 0.066;

/** Factor [0..1] on ablation under a debris cover of thickness h_d [m] (>= 0). */
export function debrisMeltFactor(debrisThickness: number): number {
  if (!(debrisThickness > 0)) return 1;
  return DEBRIS_CHARACTERISTIC_THICKNESS / (DEBRIS_CHARACTERISTIC_THICKNESS + debrisThickness);
}
