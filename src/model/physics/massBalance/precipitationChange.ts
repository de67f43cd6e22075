/**
 * Precipitation change with warming, as a fixed percentage per kelvin compounded:
 *
 *   P(dT) = P(0) * (1 + p / 100)^dT          p [% K^-1], dT [K]
 *
 * Source of the scale: the Clausius–Clapeyron relation gives about 7 % more saturation vapour
 * pressure per kelvin near the surface; observed and modelled mean precipitation rises less,
 * about 1–3 % K^-1 globally (Held & Soden 2006, J. Climate 19, "Robust responses of the
 * hydrological cycle to global warming"; values from memory). Compounding rather than adding
 * keeps P positive for any dT, and for small p dT equals the linear form 1 + p dT / 100 to
 * second order. Using one percentage for a whole glacier is common practice, not a law.
 *
 * Where it applies (see the balance models): the accumulation (b > 0) of the linear and table
 * models, so their ELA does not move with p; the precipitation of the degree-day model, whose
 * ELA does move.
 */

/** Factor on precipitation [-] for p [% K^-1] (absent: 0) under warming dT [K]. */
export function precipitationFactor(percentPerKelvin: number | undefined, warming: number): number {
  if (!percentPerKelvin || warming === 0) return 1;
  return Math.pow(1 + percentPerKelvin / 100, warming);
}
