/**
 * Surface mass balance, one of three models chosen by "model": a linear profile around an ELA,
 * a table of balance against elevation, or a degree-day model driven by air temperature.
 */
import * as z from 'zod';
import { numberField } from './numberField';
import { pointList } from './pointList';
import { SCENARIO_LIMITS as L } from './scenarioLimits';
import { strictObjectField } from './strictObjectField';

const elevationRange = { min: L.elevationMin, max: L.elevationMax };

const elaSensitivity = numberField(
  'the ELA sensitivity',
  'm K^-1',
  { min: 0, max: L.elaSensitivityMax },
  'Rise of the ELA (linear) or upward shift of the table per kelvin of warming [m K^-1]. Default 100.',
).optional();

const precipitationPerK = (applies: string) =>
  numberField(
    'the precipitation change per kelvin',
    '% K^-1',
    { min: L.precipitationPerKMin, max: L.precipitationPerKMax },
    `Change of ${applies} per kelvin of warming [% K^-1], compounded: factor (1 + p/100)^warming. ` +
      'Default 0. About 7 from Clausius–Clapeyron; 1–3 for global mean precipitation (Held & Soden 2006).',
  ).optional();

const linearBalance = strictObjectField('the linear mass balance', {
  model: z.literal('linear').describe('Linear balance profile around an equilibrium-line altitude.'),
  ela: numberField('the equilibrium-line altitude', 'm a.s.l.', elevationRange, 'Equilibrium-line altitude at zero warming [m a.s.l.].'),
  ablationGradient: numberField(
    'the ablation gradient',
    '(m w.e. a^-1) m^-1',
    { min: 0, minExclusive: true, max: L.gradientMax },
    'Ablation gradient: the balance gradient below the ELA [(m w.e. a^-1) m^-1].',
  ),
  accumulationGradient: numberField(
    'the accumulation gradient',
    '(m w.e. a^-1) m^-1',
    { min: 0, max: L.gradientMax },
    'Accumulation gradient: the balance gradient above the ELA [(m w.e. a^-1) m^-1]. Default: ablationGradient.',
  ).optional(),
  maxAccumulation: numberField(
    'the largest accumulation',
    'm w.e. a^-1',
    { min: 0, minExclusive: true, max: L.maxAccumulationMax },
    'Cap on the balance above the ELA [m w.e. a^-1]. Default: no cap.',
  ).optional(),
  elaSensitivity,
  precipitationPerK: precipitationPerK('the accumulation (b > 0)'),
}).describe('b = ablationGradient * (z - ELA) below the ELA, accumulationGradient * (z - ELA) above it, capped.');

const tableBalance = strictObjectField('the table mass balance', {
  model: z.literal('table').describe('Balance interpolated in a table of elevation and balance.'),
  points: pointList({
    what: 'the balance table',
    layout: '[elevation m a.s.l., balance m w.e. a^-1]',
    xName: 'elevation',
    x: numberField('a table elevation', 'm a.s.l.', elevationRange, 'Elevation [m a.s.l.].'),
    y: numberField(
      'a table balance',
      'm w.e. a^-1',
      { min: -L.balanceAbsMax, max: L.balanceAbsMax },
      'Surface mass balance at that elevation [m w.e. a^-1].',
    ),
    minPoints: 2,
    description:
      'Balance table [[elevation m a.s.l., balance m w.e. a^-1], ...], elevation strictly increasing; ' +
      'piecewise linear, constant beyond the ends.',
  }),
  elaSensitivity,
  precipitationPerK: precipitationPerK('the accumulation (b > 0)'),
}).describe('Balance from a table against elevation; warming shifts the table up.');

const degreeDayBalance = strictObjectField('the degree-day mass balance', {
  model: z.literal('degree-day').describe('Accumulation from precipitation, melt from positive degree-days.'),
  referenceElevation: numberField(
    'the reference elevation',
    'm a.s.l.',
    elevationRange,
    'Elevation at which meanTemperature and precipitation apply [m a.s.l.].',
  ),
  meanTemperature: numberField(
    'the mean air temperature',
    'deg C',
    { min: L.airTemperatureMin, max: L.airTemperatureMax },
    'Annual mean air temperature at the reference elevation [deg C].',
  ),
  amplitude: numberField(
    'the temperature amplitude',
    'K',
    { min: 0, max: L.amplitudeMax },
    'Half the range of the annual air-temperature cycle [K].',
  ),
  lapseRate: numberField(
    'the lapse rate',
    'K m^-1',
    { min: 0, max: L.lapseRateMax },
    'Decrease of air temperature with height [K m^-1].',
  ),
  precipitation: numberField(
    'the precipitation',
    'm w.e. a^-1',
    { min: 0, max: L.precipitationMax },
    'Annual precipitation at the reference elevation [m w.e. a^-1].',
  ),
  precipitationGradient: numberField(
    'the precipitation gradient',
    'm^-1',
    { min: -L.precipitationGradientAbsMax, max: L.precipitationGradientAbsMax },
    'Relative change of precipitation with height [fraction per m].',
  ),
  snowThreshold: numberField(
    'the snow threshold',
    'deg C',
    { min: -L.snowThresholdAbsMax, max: L.snowThresholdAbsMax },
    'Air temperature below which precipitation falls as snow [deg C].',
  ),
  ddfSnow: numberField(
    'the degree-day factor for snow',
    'mm w.e. K^-1 d^-1',
    { min: 0, minExclusive: true, max: L.degreeDayFactorMax },
    'Degree-day factor for snow [mm w.e. K^-1 d^-1].',
  ),
  ddfIce: numberField(
    'the degree-day factor for ice',
    'mm w.e. K^-1 d^-1',
    { min: 0, minExclusive: true, max: L.degreeDayFactorMax },
    'Degree-day factor for ice [mm w.e. K^-1 d^-1].',
  ),
  precipitationPerK: precipitationPerK('the precipitation'),
  dailyTemperatureSd: numberField(
    'the daily temperature spread',
    'K',
    { min: 0, max: L.dailyTemperatureSdMax },
    'Standard deviation of air temperature about the annual cycle [K] (day-to-day weather); degree-days and snow as expected values ' +
      '(Calov & Greve 2005). Default 0 (the plain sinusoid). About 4-5 K is common practice.',
  ).optional(),
  refreezingFraction: numberField(
    'the refreezing fraction',
    '',
    { min: 0, max: 1 },
    'Share of the snow melt and rain that refreezes in the snowpack [-], at most 0.6 of the year\'s snowfall (Reeh 1991). Default 0.',
  ).optional(),
}).describe('Balance from a degree-day model; warming raises the air temperature.');

export const massBalanceSchema = z
  .discriminatedUnion('model', [linearBalance, tableBalance, degreeDayBalance], {
    error: 'the mass balance must be a JSON object whose "model" is "linear", "table" or "degree-day"',
  })
  .describe('Surface mass balance [m w.e. a^-1]; "model" chooses one of three forms.');
