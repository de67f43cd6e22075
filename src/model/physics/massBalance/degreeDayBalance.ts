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
 * Simplifications, stated: the annual cycle is a sinusoid of half-range `amplitude` (with the
 * optional normal spread above); rain runs off; refreezing and superimposed ice are ignored; the snow that falls in a
 * year is the snow available to melt that year.
 */
import type { DegreeDayBalanceSpec } from '../../scenario';
import { findEquilibriumLine, type MassBalanceModel } from './massBalanceModel';
import { precipitationFactor } from './precipitationChange';
import { annualPositiveDegreeDays, fractionOfYearBelow } from './positiveDegreeDays';
import { annualPositiveDegreeDaysWithSpread, fractionOfYearBelowWithSpread } from './temperatureSpread';

/** mm w.e. -> m w.e. */
const MM_TO_M = 1e-3;

export function degreeDayBalance(spec: DegreeDayBalanceSpec): MassBalanceModel {
  const ddfSnow = spec.ddfSnow * MM_TO_M;
  const ddfIce = spec.ddfIce * MM_TO_M;
  const sigma = spec.dailyTemperatureSd ?? 0;
  const positiveDegreeDays = (mean: number) =>
    sigma > 0 ? annualPositiveDegreeDaysWithSpread(mean, spec.amplitude, sigma) : annualPositiveDegreeDays(mean, spec.amplitude);
  const snowFraction = (mean: number) =>
    sigma > 0 ? fractionOfYearBelowWithSpread(spec.snowThreshold, mean, spec.amplitude, sigma) : fractionOfYearBelow(spec.snowThreshold, mean, spec.amplitude);
  const balanceAt = (z: number, warming: number, factor = 1): number => {
    const dz = z - spec.referenceElevation;
    const mean = spec.meanTemperature + warming - spec.lapseRate * dz;
    const precipitation =
      spec.precipitation * Math.max(0, 1 + spec.precipitationGradient * dz) * precipitationFactor(spec.precipitationPerK, warming) * factor;
    const snowfall = precipitation * snowFraction(mean);
    const degreeDays = positiveDegreeDays(mean);
    const snowMeltCapacity = ddfSnow * degreeDays;
    if (snowMeltCapacity <= snowfall) return snowfall - snowMeltCapacity;
    const degreeDaysLeft = degreeDays - snowfall / ddfSnow;
    return -ddfIce * degreeDaysLeft;
  };
  return {
    balanceAt,
    equilibriumLineAltitude: (warming, factor = 1) => findEquilibriumLine((z) => balanceAt(z, warming, factor)),
  };
}
