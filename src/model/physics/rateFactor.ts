/**
 * Rate factor A of Glen's flow law from ice temperature.
 *
 *   A = E * A* * exp( -(Qc / R) * (1/Th - 1/T*) )
 *
 * with A* = 3.5e-25 Pa^-3 s^-1, T* = 263.15 K (-10 C), Qc = 60 kJ mol^-1 for Th < T* and
 * 115 kJ mol^-1 above, R = 8.314 J mol^-1 K^-1, E the enhancement factor.
 * Source: Cuffey & Paterson (2010), The Physics of Glaciers, 4th ed., section 3.4.6 (eq. 3.35).
 *
 * Th is the temperature relative to the pressure-melting point ("homologous"), in kelvin;
 * the scenario gives it in degrees C (at most 0) and no further pressure correction is applied.
 * The relation is calibrated for n = 3; for other n the value is used as given, as is usual.
 */

/** Reference rate factor A* [Pa^-3 s^-1] (Cuffey & Paterson 2010). */
const REFERENCE_RATE_FACTOR = 3.5e-25;
/** Reference temperature T* [K] (-10 C). */
const REFERENCE_TEMPERATURE = 263.15;
/** Activation energy below T* [J mol^-1]. */
const ACTIVATION_ENERGY_COLD = 60e3;
/** Activation energy above T* (warm ice, grain-boundary processes) [J mol^-1]. */
const ACTIVATION_ENERGY_WARM = 115e3;
/** Universal gas constant R [J mol^-1 K^-1]. */
const GAS_CONSTANT = 8.314;
/** 0 C in kelvin. */
const ZERO_CELSIUS = 273.15;

/**
 * Rate factor A [Pa^-3 s^-1] for ice at `temperatureC` degrees C below the pressure-melting
 * point (so 0 is temperate ice), multiplied by `enhancement` (default 1).
 */
export function rateFactorFromTemperature(temperatureC: number, enhancement = 1): number {
  const homologousKelvin = temperatureC + ZERO_CELSIUS;
  const activation =
    homologousKelvin < REFERENCE_TEMPERATURE ? ACTIVATION_ENERGY_COLD : ACTIVATION_ENERGY_WARM;
  const exponent = -(activation / GAS_CONSTANT) * (1 / homologousKelvin - 1 / REFERENCE_TEMPERATURE);
  return enhancement * REFERENCE_RATE_FACTOR * Math.exp(exponent);
}
