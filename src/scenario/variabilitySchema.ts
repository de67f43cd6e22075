/**
 * Year-to-year weather (model/random/weather.ts): standard deviations of the annual temperature
 * anomaly and precipitation factor, a whole-number seed and an optional lag-one autocorrelation.
 */
import * as z from 'zod';
import { formatNumber } from './formatNumber';
import { numberField } from './numberField';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

const seedAllowed = `the seed must be a whole number from 0 to ${formatNumber(L.seedMax)}`;

export const variabilitySchema = strictObjectField('the variability', {
  temperatureSd: numberField(
    'the temperature standard deviation',
    'K',
    { min: 0, max: L.temperatureSdMax },
    'Standard deviation of the annual temperature anomaly [K]; about 0.5–1 K for summer temperatures in the Alps (common practice).',
  ),
  precipitationSd: numberField(
    'the precipitation standard deviation',
    '',
    { min: 0, max: L.precipitationSdMax },
    'Standard deviation of the annual precipitation factor [-], a fraction of the mean (0.1–0.2 is common practice); the factor is 1 + sd * a, at least 0.',
  ),
  seed: z
    .number({ error: seedAllowed })
    .int({ error: seedAllowed })
    .min(0, { error: seedAllowed })
    .max(L.seedMax, { error: seedAllowed })
    .describe('Seed of the random weather [-], a whole number: the same seed gives the same weather in every run and program.'),
  ar1: numberField(
    'the lag-one autocorrelation',
    '',
    { min: 0, max: 1, maxExclusive: true },
    'Lag-one autocorrelation of the annual anomalies [-], at least 0 and less than 1. Default 0 (each year independent).',
  ).optional(),
}).describe('Year-to-year weather: seeded random annual anomalies of temperature and precipitation (SplitMix64, Box–Muller, AR(1)).');
