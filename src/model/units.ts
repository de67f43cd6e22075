/**
 * Physical constants and unit conversions used throughout the model.
 * Everything inside the model is SI except time, which is in years [a]
 * (1 a = 365.25 d, the Julian year, as the scenario format states).
 */

/** Seconds in one year [s a^-1]; Julian year of 365.25 days. */
export const SECONDS_PER_YEAR = 365.25 * 24 * 3600;

/** Days in one year [d a^-1]. */
export const DAYS_PER_YEAR = 365.25;

/** Gravitational acceleration g [m s^-2]; conventional value used in glaciology texts. */
export const GRAVITY = 9.81;

/** Density of water [kg m^-3], used to turn metres water equivalent into metres of ice. */
export const WATER_DENSITY = 1000;

/** Default bulk density of glacier ice [kg m^-3] (900-917 in use; Cogley et al. 2011 glossary). */
export const DEFAULT_ICE_DENSITY = 910;

/** Convert a rate factor from per second to per year: A [Pa^-n s^-1] -> [Pa^-n a^-1]. */
export function perSecondToPerYear(valuePerSecond: number): number {
  return valuePerSecond * SECONDS_PER_YEAR;
}

/** Convert metres water equivalent to metres of ice [m w.e. -> m ice]. */
export function waterEquivalentToIce(metresWaterEquivalent: number, iceDensity: number): number {
  return (metresWaterEquivalent * WATER_DENSITY) / iceDensity;
}
