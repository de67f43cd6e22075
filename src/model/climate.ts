/**
 * The climate a scenario applies at model year t: the warming dT(t) [K] and a factor on
 * precipitation P(t) [-]. Two ways to give it, never both (the validator refuses both):
 *
 *   warming: [[year, dT], ...]                        dT piecewise linear, P = 1
 *   forcing: [[year, dT, P], ...]                     both piecewise linear in the year
 *
 * Both are constant beyond their ends; neither means dT = 0 and P = 1. The forcing replaces the
 * warming: it is the user's own series (e.g. a temperature anomaly and a precipitation ratio by
 * year, from a station or a climate projection), so its P already holds any precipitation change
 * and `massBalance.precipitationPerK` may not be given with it either. P multiplies the
 * accumulation (linear and table models) or the precipitation (degree-day model).
 */
import { piecewiseLinear, type Point } from './piecewiseLinear';
import type { Scenario } from './scenario';
import { createWeather } from './random/weather';
import { warmingSeries } from './warming';

export interface ClimateSeries {
  /** Warming dT [K] at model year t. */
  warmingAt: (year: number) => number;
  /** Factor on precipitation [-] at model year t. */
  precipitationFactorAt: (year: number) => number;
}

/**
 * The scenario's climate with its year-to-year weather (`variability`, random/weather.ts) on top:
 * the weather's anomaly adds to the warming and its factor multiplies the precipitation factor.
 */
export function climateSeries(scenario: Pick<Scenario, 'warming' | 'forcing' | 'variability'>): ClimateSeries {
  const mean = meanClimateSeries(scenario);
  if (!scenario.variability) return mean;
  const weather = createWeather(scenario.variability);
  return {
    warmingAt: (year) => mean.warmingAt(year) + weather.temperatureAt(year),
    precipitationFactorAt: (year) => mean.precipitationFactorAt(year) * weather.precipitationFactorAt(year),
  };
}

/** The climate without year-to-year weather. */
export function meanClimateSeries(scenario: Pick<Scenario, 'warming' | 'forcing'>): ClimateSeries {
  const forcing = scenario.forcing;
  if (!forcing || forcing.length === 0) return { warmingAt: warmingSeries(scenario.warming), precipitationFactorAt: () => 1 };
  return {
    warmingAt: piecewiseLinear(forcing.map(([year, dT]): Point => [year, dT])),
    precipitationFactorAt: piecewiseLinear(forcing.map(([year, , factor]): Point => [year, factor])),
  };
}

/** The warming as [year, dT] points, from the forcing when given (for warnings, step detection, captions). */
export function warmingPoints(scenario: Pick<Scenario, 'warming' | 'forcing'>): Point[] | undefined {
  if (scenario.forcing && scenario.forcing.length > 0) return scenario.forcing.map(([year, dT]): Point => [year, dT]);
  return scenario.warming;
}

/** The scenario with its climate held at that of model year `year` (same key it came in). */
export function withClimateHeldAt<S extends Pick<Scenario, 'warming' | 'forcing' | 'variability'>>(scenario: S, year: number): S {
  const climate = climateSeries(scenario);
  const dT = climate.warmingAt(year);
  const factor = climate.precipitationFactorAt(year);
  // A held climate has no weather: that year's weather, if any, is folded into a one-row forcing.
  if (scenario.forcing !== undefined || scenario.variability !== undefined) {
    return { ...scenario, warming: undefined, variability: undefined, forcing: [[0, dT, factor]] };
  }
  return { ...scenario, warming: [[0, dT]] };
}
