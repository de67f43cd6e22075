/**
 * Positive-degree-day mass balance (Braithwaite 1995, J. Glaciol. 41(137); review Hock 2003,
 * J. Hydrol. 282), evaluated once per year in closed form:
 *
 *   T(z)      = meanTemperature + dT(t) - lapseRate * (z - referenceElevation)   annual mean [deg C]
 *   P(z)      = precipitation * max(0, 1 + precipitationGradient * (z - referenceElevation))
 *               * (1 + precipitationPerK / 100)^dT(t)     (precipitationChange.ts)     [m w.e. a^-1]
 *   snowfall  = P(z) * (fraction of the year with T < snowThreshold)   (precipitation spread evenly)
 *   melt      = snow first at ddfSnow per degree-day; the degree-days left over melt ice at ddfIce
 *   b         = snowfall - melt                                                   [m w.e. a^-1]
 *
 * With `dailyTemperatureSd` = sigma > 0 the temperature spreads normally about the sinusoid
 * (day-to-day and within-month weather): degree-days and snow fraction are then the expected
 * values of Calov & Greve (2005), averaged over the year (temperatureSpread.ts).
 *
 * With `refreezingFraction` = r > 0, a share r of the year's snow melt and rain refreezes in the
 * snowpack and stays, at most REFREEZE_SNOWPACK_SHARE (0.6) of the year's snowfall: the 60 % cap
 * of Reeh (1991, Polarforschung 59(3); from memory); a fixed share r below it is common practice.
 *
 *   b = snowfall - snow melt - ice melt + min(r (snow melt + rain), 0.6 snowfall)
 *
 * Simplifications, stated: the annual cycle is a sinusoid of half-range `amplitude` (with the
 * optional normal spread above); rain runs off; refreezing and superimposed ice are ignored; the snow that falls in a
 * year is the snow available to melt that year.
 */
import type { DegreeDayBalanceSpec } from '../../scenario';
import { findEquilibriumLine, type MassBalanceModel } from './massBalanceModel';
import { precipitationFactor } from './precipitationChange';
import { annualPositiveDegreeDays, fractionOfYearBelow } from './positiveDegreeDays';
import { annualPositiveDegreeDaysWithSpread, fractionOfYearBelowWithSpread } from './temperatureSpread';

/** Largest refrozen mass as a share of the year's snowfall [-] (Reeh 1991; from memory). */
export const REFREEZE_SNOWPACK_SHARE = 0.6;

/** mm w.e. -> m w.e. */
const MM_TO_M = 1e-3;

export function degreeDayBalance(spec: DegreeDayBalanceSpec): MassBalanceModel {
  const ddfSnow = spec.ddfSnow * MM_TO_M;
  const ddfIce = spec.ddfIce * MM_TO_M;
  const sigma = spec.dailyTemperatureSd ?? 0;
  const refreezing = spec.refreezingFraction ?? 0;
  // With a spread, each value is a year's quadrature: tabulated lazily on a fixed 0.01 K grid of
  // the annual mean and interpolated linearly (error below 1e-3 K d; the table depends only on the
  // grid node, never on the order of calls, so runs stay byte-identical).
  const spreadDegreeDays = lazyTable((mean) => annualPositiveDegreeDaysWithSpread(mean, spec.amplitude, sigma));
  const spreadSnowFraction = lazyTable((mean) => fractionOfYearBelowWithSpread(spec.snowThreshold, mean, spec.amplitude, sigma));
  const positiveDegreeDays = (mean: number) => (sigma > 0 ? spreadDegreeDays(mean) : annualPositiveDegreeDays(mean, spec.amplitude));
  const snowFraction = (mean: number) =>
    sigma > 0 ? spreadSnowFraction(mean) : fractionOfYearBelow(spec.snowThreshold, mean, spec.amplitude);
  const balanceAt = (z: number, warming: number, factor = 1): number => {
    const dz = z - spec.referenceElevation;
    const mean = spec.meanTemperature + warming - spec.lapseRate * dz;
    const precipitation =
      spec.precipitation * Math.max(0, 1 + spec.precipitationGradient * dz) * precipitationFactor(spec.precipitationPerK, warming) * factor;
    const snowfall = precipitation * snowFraction(mean);
    const degreeDays = positiveDegreeDays(mean);
    const snowMeltCapacity = ddfSnow * degreeDays;
    const snowMelt = Math.min(snowMeltCapacity, snowfall);
    const refrozen = refreezing > 0 ? Math.min(refreezing * (snowMelt + precipitation - snowfall), REFREEZE_SNOWPACK_SHARE * snowfall) : 0;
    if (snowMeltCapacity <= snowfall) return snowfall - snowMeltCapacity + refrozen;
    const degreeDaysLeft = degreeDays - snowfall / ddfSnow;
    return -ddfIce * degreeDaysLeft + refrozen;
  };
  return {
    balanceAt,
    equilibriumLineAltitude: (warming, factor = 1) => findEquilibriumLine((z) => balanceAt(z, warming, factor)),
  };
}

/** Spacing of the lazily filled tables of the spread degree-days [K]. */
export const SPREAD_TABLE_STEP = 0.01;

/** f(mean) interpolated linearly between nodes k * SPREAD_TABLE_STEP, each node computed once. */
function lazyTable(f: (mean: number) => number): (mean: number) => number {
  const nodes = new Map<number, number>();
  const node = (k: number) => {
    let v = nodes.get(k);
    if (v === undefined) {
      v = f(k * SPREAD_TABLE_STEP);
      nodes.set(k, v);
    }
    return v;
  };
  return (mean) => {
    const position = mean / SPREAD_TABLE_STEP;
    const k = Math.floor(position);
    const share = position - k;
    return share === 0 ? node(k) : node(k) + share * (node(k + 1) - node(k));
  };
}
