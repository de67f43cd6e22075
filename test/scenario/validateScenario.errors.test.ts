/**
 * Every hard rule of the scenario format gives an error that names the path (a JSON Pointer,
 * RFC 6901), repeats the offending value and says what is allowed.
 */
import { describe, expect, it } from 'vitest';
import { formatMessage, validateScenario, type ValidationMessage } from '../../src/scenario/validateScenario';
import { changed, degreeDayScenario, observedScenario as observed, tableScenario, valleyScenario as demo, type Json } from './scenarioFixtures';

function errorsOf(input: unknown): ValidationMessage[] {
  const result = validateScenario(input);
  if (result.ok) throw new Error('expected the scenario to be rejected');
  return result.errors;
}

/** [what, base scenario, mutation, expected path, fragments the message must contain]. */
type Case = [string, () => Json, (s: Json) => void, string, ...string[]];

const cases: Case[] = [
  // Identification.
  ['wrong format', demo, (s) => (s.format = 'glacier'), '/format', '"glacier"', '"firnline-scenario"'],
  ['version 2', demo, (s) => (s.version = 2), '/version', '2 is not allowed', 'must be 1'],
  ['version as a string', demo, (s) => (s.version = '1'), '/version', '"1"', 'must be 1'],
  ['missing format', demo, (s) => delete s.format, '/format', 'missing', '"firnline-scenario"'],
  ['name too long', demo, (s) => (s.name = 'x'.repeat(201)), '/name', '"xxx', 'at most 200 characters'],
  ['name not a string', demo, (s) => (s.name = 7), '/name', '7 is not allowed', 'a string'],
  // Grid.
  ['negative spacing', demo, (s) => (s.grid.spacing = -50), '/grid/spacing', '-50 is not allowed', 'at least 1 m'],
  ['spacing below 1 m', demo, (s) => (s.grid = { length: 100, spacing: 0.5 }), '/grid/spacing', '0.5', 'at least 1 m'],
  ['zero length', demo, (s) => (s.grid.length = 0), '/grid/length', '0 is not allowed', 'greater than 0 and at most 1,000,000 m'],
  ['length over 1000 km', demo, (s) => (s.grid.length = 2e6), '/grid/length', '2000000', 'at most 1,000,000 m'],
  ['length as a string', demo, (s) => (s.grid.length = '12000'), '/grid/length', '"12000"', 'finite number'],
  ['cells not whole', demo, (s) => (s.grid.spacing = 70), '/grid/spacing', '70 is not allowed', 'whole number of cells', '15,000 m / 70 m = 214.28571 cells'],
  ['more than 100,000 cells', demo, (s) => (s.grid = { length: 200000, spacing: 1 }), '/grid/spacing', '200,000 cells', 'at most 100,000 cells', 'at least 2 m'],
  ['fewer than 2 cells', demo, (s) => (s.grid = { length: 100, spacing: 100 }), '/grid/spacing', '100 is not allowed', 'at least 2 cells, but 100 m / 100 m = 1 cell;', 'at most 50 m'],
  // Point lists: bed.
  ['bed with one point', demo, (s) => (s.bed = [[0, 3000]]), '/bed', '[[0,3000]]', '2 to 10,000 points'],
  ['bed with 10,001 points', demo, (s) => (s.bed = Array.from({ length: 10001 }, (_, i) => [i, 2000])), '/bed', '10001 items', '2 to 10,000 points'],
  ['bed point with three numbers', demo, (s) => (s.bed[1] = [2000, 2950, 5]), '/bed/1', '[2000,2950,5]', 'exactly two numbers'],
  ['bed point not a list', demo, (s) => (s.bed[1] = { x: 2000 }), '/bed/1', '{"x":2000}', 'exactly two numbers'],
  ['bed x not increasing', demo, (s) => (s.bed[3][0] = 5000), '/bed/3/0', '5000 is not allowed', 'greater than the x of the point before it', '5000 at index 2'],
  ['bed x repeated at the start', demo, (s) => (s.bed[1][0] = 0), '/bed/1/0', '0 is not allowed', 'index 0'],
  ['bed elevation too low', demo, (s) => (s.bed[0][1] = -1500), '/bed/0/1', '-1500', 'from -1000 to 9000 m a.s.l.'],
  ['bed elevation too high', demo, (s) => (s.bed[0][1] = 9500), '/bed/0/1', '9500', 'from -1000 to 9000 m a.s.l.'],
  ['bed x absurdly far', demo, (s) => (s.bed[6][0] = 1e8), '/bed/6/0', '100000000', 'from -10,000,000 to 10,000,000 m'],
  ['bed elevation a string', demo, (s) => (s.bed[2][1] = '2600'), '/bed/2/1', '"2600"', 'finite number'],
  // Width, shape factor, surface.
  ['zero width', demo, (s) => (s.width[0][1] = 0), '/width/0/1', '0 is not allowed', 'greater than 0 and at most 100,000 m'],
  ['width over 100 km', demo, (s) => (s.width[0][1] = 2e5), '/width/0/1', '200000', 'at most 100,000 m'],
  ['empty width list', demo, (s) => (s.width = []), '/width', '[]', '1 to 10,000 points'],
  ['width x not increasing', demo, (s) => (s.width[2][0] = 3000), '/width/2/0', '3000 is not allowed', 'index 1'],
  // Nye (1965): the shape factor is a fraction of the wide-channel stress, 0 < f <= 1.
  ['shape factor zero', demo, (s) => (s.shapeFactor = 0), '/shapeFactor', '0 is not allowed', 'greater than 0 and at most 1'],
  ['shape factor above 1', demo, (s) => (s.shapeFactor = 1.5), '/shapeFactor', '1.5', 'at most 1'],
  ['unknown cross section', demo, (s) => (s.shapeFactor = { crossSection: 'round' }), '/shapeFactor/crossSection', '"round"', '"parabolic", "semi-elliptic" or "rectangular"'],
  ['shape factor a string', demo, (s) => (s.shapeFactor = 'parabolic'), '/shapeFactor', '"parabolic"', 'a number greater than 0 and at most 1, or {"crossSection"'],
  ['surface too high', demo, (s) => (s.surface[0][1] = 12000), '/surface/0/1', '12000', 'from -1000 to 10,000 m a.s.l.'],
  ['empty surface list', demo, (s) => (s.surface = []), '/surface', '[]', '1 to 10,000 points'],
  // Ice.
  ['n below 1', demo, (s) => (s.ice.n = 0.5), '/ice/n', '0.5', 'from 1 to 5'],
  ['n above 5', demo, (s) => (s.ice.n = 6), '/ice/n', '6 is not allowed', 'from 1 to 5'],
  ['A zero', demo, (s) => (s.ice.A = 0), '/ice/A', '0 is not allowed', 'greater than 0 Pa^-n s^-1'],
  ['A negative', demo, (s) => (s.ice.A = -2.4e-24), '/ice/A', '-2.4e-24', 'greater than 0'],
  ['A too large for n = 3', demo, (s) => (s.ice.A = 1e-19), '/ice/A', '1e-19', 'at most 1e-20 Pa^-3 s^-1'],
  ['A too large for n = 1', demo, (s) => (s.ice = { n: 1, A: 1e-9 }), '/ice/A', '1e-9', 'at most 1e-10'],
  ['A and temperature both', demo, (s) => (s.ice.temperature = -5), '/ice', '"temperature":-5', 'exactly one of "A" and "temperature"'],
  ['neither A nor temperature', demo, (s) => delete s.ice.A, '/ice', '{"n":3,"density":910}', 'exactly one of "A"'],
  ['temperature above melting', tableScenario, (s) => (s.ice.temperature = 1), '/ice/temperature', '1 is not allowed', 'from -60 to 0 deg C'],
  ['temperature below -60', tableScenario, (s) => (s.ice.temperature = -80), '/ice/temperature', '-80', 'from -60 to 0 deg C'],
  ['enhancement zero', tableScenario, (s) => (s.ice.enhancement = 0), '/ice/enhancement', '0 is not allowed', 'greater than 0 and at most 100'],
  ['enhancement over 100', tableScenario, (s) => (s.ice.enhancement = 150), '/ice/enhancement', '150', 'at most 100'],
  ['enhancement with A', demo, (s) => (s.ice.enhancement = 2), '/ice/enhancement', '2 is not allowed', 'fold it into A'],
  ['density too low', demo, (s) => (s.ice.density = 700), '/ice/density', '700', 'from 800 to 1000 kg m^-3'],
  ['density too high', demo, (s) => (s.ice.density = 1030), '/ice/density', '1030', 'from 800 to 1000 kg m^-3'],
  // Sliding.
  ['negative C', demo, (s) => (s.sliding.C = -1e-14), '/sliding/C', '-1e-14', 'of at least 0 m a^-1 Pa^-m'],
  ['m below 1', demo, (s) => (s.sliding.m = 0), '/sliding/m', '0 is not allowed', 'from 1 to 10'],
  ['m above 10', demo, (s) => (s.sliding.m = 12), '/sliding/m', '12', 'from 1 to 10'],
  ['sliding absurdly fast', demo, (s) => (s.sliding.C = 1e-8), '/sliding/C', '1e-8', 'at most 1,000,000 m a^-1', 'at most 1e-9'],
  ['sliding without m', demo, (s) => delete s.sliding.m, '/sliding/m', 'missing', 'from 1 to 10'],
  // Mass balance.
  ['unknown balance model', demo, (s) => (s.massBalance.model = 'energy'), '/massBalance/model', '"energy"', '"linear", "table" or "degree-day"'],
  ['balance not an object', demo, (s) => (s.massBalance = 3), '/massBalance', '3 is not allowed', '"linear", "table" or "degree-day"'],
  ['ELA too high', demo, (s) => (s.massBalance.ela = 12000), '/massBalance/ela', '12000', 'from -1000 to 10,000 m a.s.l.'],
  ['gradient zero', demo, (s) => (s.massBalance.ablationGradient = 0), '/massBalance/ablationGradient', '0 is not allowed', 'greater than 0 and at most 0.1'],
  ['gradient too steep', demo, (s) => (s.massBalance.ablationGradient = 0.2), '/massBalance/ablationGradient', '0.2', 'at most 0.1'],
  ['negative accumulation gradient', demo, (s) => (s.massBalance.accumulationGradient = -0.001), '/massBalance/accumulationGradient', '-0.001', 'from 0 to 0.1'],
  ['zero accumulation cap', demo, (s) => (s.massBalance.maxAccumulation = 0), '/massBalance/maxAccumulation', '0 is not allowed', 'greater than 0 and at most 20'],
  ['ELA sensitivity too large', demo, (s) => (s.massBalance.elaSensitivity = 5000), '/massBalance/elaSensitivity', '5000', 'from 0 to 1000 m K^-1'],
  ['precipitation change too negative', demo, (s) => (s.massBalance.precipitationPerK = -25), '/massBalance/precipitationPerK', '-25', 'from -20 to 30 % K^-1'],
  ['precipitation change not a number', degreeDayScenario, (s) => (s.massBalance.precipitationPerK = '7'), '/massBalance/precipitationPerK', '"7"', 'from -20 to 30 % K^-1'],
  ['negative temperature spread', degreeDayScenario, (s) => (s.massBalance.dailyTemperatureSd = -1), '/massBalance/dailyTemperatureSd', '-1', 'from 0 to 10 K'],
  ['refreezing fraction above 1', degreeDayScenario, (s) => (s.massBalance.refreezingFraction = 1.5), '/massBalance/refreezingFraction', '1.5', 'from 0 to 1'],
  ['table with one point', tableScenario, (s) => (s.massBalance.points = [[2800, 0]]), '/massBalance/points', '[[2800,0]]', '2 to 10,000 points'],
  ['table elevation not increasing', tableScenario, (s) => (s.massBalance.points[2][0] = 2700), '/massBalance/points/2/0', '2700', 'elevation of the point before it (2800 at index 1)'],
  ['table balance too large', tableScenario, (s) => (s.massBalance.points[2][1] = 150), '/massBalance/points/2/1', '150', 'from -100 to 100 m w.e. a^-1'],
  ['lapse rate too steep', degreeDayScenario, (s) => (s.massBalance.lapseRate = 0.02), '/massBalance/lapseRate', '0.02', 'from 0 to 0.015 K m^-1'],
  ['amplitude too large', degreeDayScenario, (s) => (s.massBalance.amplitude = 45), '/massBalance/amplitude', '45', 'from 0 to 40 K'],
  ['negative precipitation', degreeDayScenario, (s) => (s.massBalance.precipitation = -1), '/massBalance/precipitation', '-1', 'from 0 to 20 m w.e. a^-1'],
  ['precipitation gradient too large', degreeDayScenario, (s) => (s.massBalance.precipitationGradient = 0.01), '/massBalance/precipitationGradient', '0.01', 'from -0.005 to 0.005'],
  ['degree-day factor zero', degreeDayScenario, (s) => (s.massBalance.ddfSnow = 0), '/massBalance/ddfSnow', '0 is not allowed', 'greater than 0 and at most 50 mm w.e. K^-1 d^-1'],
  ['degree-day factor too large', degreeDayScenario, (s) => (s.massBalance.ddfIce = 60), '/massBalance/ddfIce', '60', 'at most 50'],
  ['snow threshold too warm', degreeDayScenario, (s) => (s.massBalance.snowThreshold = 20), '/massBalance/snowThreshold', '20', 'from -10 to 10 deg C'],
  ['mean temperature too warm', degreeDayScenario, (s) => (s.massBalance.meanTemperature = 50), '/massBalance/meanTemperature', '50', 'from -60 to 40 deg C'],
  ['reference elevation missing', degreeDayScenario, (s) => delete s.massBalance.referenceElevation, '/massBalance/referenceElevation', 'missing', 'from -1000 to 10,000 m a.s.l.'],
  // Warming, spinup, run.
  ['warming years not increasing', demo, (s) => (s.warming = [[0, 0], [0, 1]]), '/warming/1/0', '0 is not allowed', 'year of the point before it'],
  ['warming too large', demo, (s) => (s.warming[1][1] = 60), '/warming/1/1', '60', 'from -50 to 50 K'],
  // Debris cover.
  ['negative debris', demo, (s) => (s.debris = [[0, 0], [5000, -0.1]]), '/debris/1/1', '-0.1', 'from 0 to 10 m'],
  ['debris x not increasing', demo, (s) => (s.debris = [[5000, 0.1], [4000, 0.2]]), '/debris/1/0', '4000', 'greater than the x of the point before it'],
  ['debris empty', demo, (s) => (s.debris = []), '/debris', '[]', '1 to 10,000 points'],
  // Frontal ablation (c from 0 to 100 a^-1).
  ['negative calving coefficient', demo, (s) => (s.frontalAblation = { waterDepthCoefficient: -1 }), '/frontalAblation/waterDepthCoefficient', '-1', 'from 0 to 100'],
  ['calving coefficient too large', demo, (s) => (s.frontalAblation = { waterDepthCoefficient: 150 }), '/frontalAblation/waterDepthCoefficient', '150', 'from 0 to 100'],
  ['calving key unknown', demo, (s) => (s.frontalAblation = { waterDepthCoefficient: 2, coefficient: 2 }), '/frontalAblation/coefficient', 'coefficient', 'allows only the keys "waterDepthCoefficient"'],
  // Valley section (the demo has a width and a parabolic side-drag table).
  ['section shape unknown', demo, (s) => (s.section = { shape: 'round', widening: 100 }), '/section/shape', '"round"', '"rectangular", "trapezoidal" or "parabolic"'],
  ['section widening zero', demo, (s) => (s.section = { shape: 'parabolic', widening: 0 }), '/section/widening', '0 is not allowed', 'greater than 0 and at most 100,000 m'],
  ['section widening negative', demo, (s) => (s.section = { shape: 'parabolic', widening: -50 }), '/section/widening', '-50', 'greater than 0'],
  ['trapezoid without widening', demo, (s) => (s.section = { shape: 'trapezoidal' }), '/section/widening', 'a trapezoidal section needs "widening"', 'at most 100,000 m'],
  ['rectangle with widening', demo, (s) => ((s.section = { shape: 'rectangular', widening: 100 }), (s.shapeFactor = { crossSection: 'rectangular' })), '/section/widening', '100', 'leave out the widening for a rectangular section'],
  ['section key unknown', demo, (s) => (s.section = { shape: 'parabolic', widening: 100, angle: 30 }), '/section/angle', 'angle', 'allows only the keys "shape", "widening"'],
  ['section without width', demo, (s) => (delete s.width, (s.section = { shape: 'parabolic', widening: 100 })), '/section', 'needs "width", the valley-floor width'],
  ['section with another side-drag table', demo, (s) => (s.section = { shape: 'rectangular' }), '/shapeFactor/crossSection', '"parabolic"', 'must be the section\'s own: "rectangular" for a rectangular section'],
  // Year-to-year weather.
  ['seed not whole', demo, (s) => (s.variability = { temperatureSd: 0.5, precipitationSd: 0.1, seed: 1.5 }), '/variability/seed', '1.5', 'whole number from 0 to 4,294,967,295'],
  ['negative temperature sd', demo, (s) => (s.variability = { temperatureSd: -0.5, precipitationSd: 0.1, seed: 1 }), '/variability/temperatureSd', '-0.5', 'from 0 to 5 K'],
  ['ar1 of 1', demo, (s) => (s.variability = { temperatureSd: 0.5, precipitationSd: 0.1, seed: 1, ar1: 1 }), '/variability/ar1', '1 is not allowed', 'at least 0 and less than 1'],
  ['variability without a seed', demo, (s) => (s.variability = { temperatureSd: 0.5, precipitationSd: 0.1 }), '/variability/seed', 'missing', 'whole number'],
  // Forcing series.
  ['forcing empty', demo, (s) => { delete s.warming; s.forcing = []; }, '/forcing', '[]', '1 to 10,000 rows [year a, warming K, precipitation factor]'],
  ['forcing years not increasing', demo, (s) => { delete s.warming; s.forcing = [[0, 0, 1], [50, 1, 1.1], [50, 2, 1.2]]; }, '/forcing/2/0', '50 is not allowed', 'greater than the year of the row before it (50 at index 1)'],
  ['forcing factor zero', demo, (s) => { delete s.warming; s.forcing = [[0, 0, 1], [50, 1, 0]]; }, '/forcing/1/2', '0 is not allowed', 'greater than 0 and at most 10'],
  ['forcing row of two numbers', demo, (s) => { delete s.warming; s.forcing = [[0, 0]]; }, '/forcing/0', '[0,0]', 'exactly three numbers'],
  ['forcing beside warming', demo, (s) => (s.forcing = [[0, 0, 1]]), '/forcing', 'either "warming" or "forcing", not both'],
  ['forcing beside precipitationPerK', demo, (s) => { delete s.warming; s.forcing = [[0, 0, 1]]; s.massBalance.precipitationPerK = 5; }, '/massBalance/precipitationPerK', '5', 'leave out the precipitation change per kelvin'],
  ['spinup not a boolean', demo, (s) => (s.spinup = 'yes'), '/spinup', '"yes"', 'true or false'],
  ['zero run length', demo, (s) => (s.run.years = 0), '/run/years', '0 is not allowed', 'greater than 0 and at most 100,000 a'],
  ['run over 100,000 years', demo, (s) => (s.run.years = 2e5), '/run/years', '200000', 'at most 100,000 a'],
  ['zero output interval', demo, (s) => (s.run.outputEvery = 0), '/run/outputEvery', '0 is not allowed', 'greater than 0'],
  ['output interval longer than the run', demo, (s) => (s.run.outputEvery = 500), '/run/outputEvery', '500', 'at most the run length (400 a)'],
  ['too many outputs', demo, (s) => (s.run = { years: 100000, outputEvery: 0.5 }), '/run/outputEvery', '0.5', 'at most 100,000 output intervals', 'at least 1 a'],
  // Start from the glacier as it is today.
  ['start from an unknown state', observed, (s) => (s.start = { from: 'steady' }), '/start/from', '"steady"', '{"from": "observed"} or {"from": "transient"'],
  ['start not an object', observed, (s) => (s.start = 'observed'), '/start', '"observed"', '{"from": "observed"} or {"from": "transient"'],
  ['observed start with an extra key', observed, (s) => (s.start = { from: 'observed', startYear: -50 }), '/start/startYear', 'unknown key "startYear"', 'the observed start allows only the keys "from"'],
  ['transient start without a start year', observed, (s) => (s.start = { from: 'transient' }), '/start/startYear', 'missing', 'the start year must be a finite number at least -10,000 and less than 0 a'],
  ['transient start year 0', observed, (s) => (s.start = { from: 'transient', startYear: 0 }), '/start/startYear', '0 is not allowed', 'less than 0 a'],
  ['transient start year too early', observed, (s) => (s.start = { from: 'transient', startYear: -20000 }), '/start/startYear', '-20000', 'at least -10,000'],
  ['climate offset too large', observed, (s) => (s.start = { from: 'transient', startYear: -100, climateOffset: 30 }), '/start/climateOffset', '30 is not allowed', 'from -16 to 16 K'],
  ['start with spinup', observed, (s) => ((s.start = { from: 'observed' }), (s.spinup = true)), '/spinup', 'true is not allowed', 'exclude each other'],
  ['start without a surface', observed, (s) => ((s.start = { from: 'observed' }), delete s.surface), '/start', 'needs the observed glacier: its surface (/surface)'],
  ['start with an observation year not 0', observed, (s) => ((s.start = { from: 'observed' }), (s.observations.year = 2020)), '/observations/year', '2020 is not allowed', 'the observation year must be 0'],
  ['fitted transient start without a terminus', observed, (s) => ((s.start = { from: 'transient', startYear: -100 }), delete s.observations.terminus), '/start', 'give /observations/terminus, or a fixed climateOffset'],
  // Observations.
  ['observations not an object', observed, (s) => (s.observations = []), '/observations', '[] is not allowed', 'the observations must be a JSON object with the keys "year", "terminus"'],
  ['observation year too far', observed, (s) => (s.observations.year = 2e6), '/observations/year', '2000000', 'from -1,000,000 to 1,000,000 a'],
  ['thickness beyond the domain', observed, (s) => (s.observations.thickness[4][0] = 15500), '/observations/thickness/4/0', '15500 is not allowed', 'the x of each thickness observation must lie within the domain, from 0 to 15,000 m (grid.length)'],
  ['thickness x negative', observed, (s) => (s.observations.thickness[0][0] = -10), '/observations/thickness/0/0', '-10 is not allowed', 'the x of each thickness observation must be a finite number from 0 to 1,000,000 m'],
  ['thickness negative', observed, (s) => (s.observations.thickness[2][1] = -5), '/observations/thickness/2/1', '-5 is not allowed', 'the observed thickness must be a finite number from 0 to 5000 m'],
  ['thickness over 5 km', observed, (s) => (s.observations.thickness[2][1] = 6000), '/observations/thickness/2/1', '6000', 'from 0 to 5000 m'],
  ['thickness uncertainty zero', observed, (s) => (s.observations.thickness[1][2] = 0), '/observations/thickness/1/2', '0 is not allowed', 'greater than 0 and at most 5000 m', 'a zero uncertainty cannot weight a fit'],
  ['thickness uncertainty negative', observed, (s) => (s.observations.thickness[1][2] = -3), '/observations/thickness/1/2', '-3', 'greater than 0'],
  ['thickness position repeated', observed, (s) => (s.observations.thickness[2][0] = 4000), '/observations/thickness/2/0', '4000 is not allowed', 'greater than the x of the one before it (4000 at index 1)', 'combine measurements at one position'],
  ['thickness positions falling', observed, (s) => (s.observations.thickness[3][0] = 5000), '/observations/thickness/3/0', '5000', 'index 2'],
  ['thickness point of two numbers', observed, (s) => (s.observations.thickness[0] = [2500, 210]), '/observations/thickness/0', '[2500,210]', 'exactly three numbers [x m, value m, uncertainty m]'],
  ['empty thickness list', observed, (s) => (s.observations.thickness = []), '/observations/thickness', '[]', '1 to 10,000 points'],
  ['thickness NaN', observed, (s) => (s.observations.thickness[0][1] = NaN), '/observations/thickness/0/1', 'NaN', 'finite number'],
  ['speed negative', observed, (s) => (s.observations.surfaceSpeed[3][1] = -1), '/observations/surfaceSpeed/3/1', '-1 is not allowed', 'the observed surface speed must be a finite number from 0 to 100,000 m a^-1'],
  ['speed uncertainty zero', observed, (s) => (s.observations.surfaceSpeed[0][2] = 0), '/observations/surfaceSpeed/0/2', '0 is not allowed', 'a zero uncertainty cannot weight a fit'],
  ['speed beyond the domain', observed, (s) => (s.observations.surfaceSpeed[5][0] = 20000), '/observations/surfaceSpeed/5/0', '20000', 'within the domain, from 0 to 15,000 m'],
  ['terminus beyond the domain', observed, (s) => (s.observations.terminus = 16000), '/observations/terminus', '16000 is not allowed', 'the terminus position must lie within the domain, from 0 to 15,000 m (grid.length)'],
  ['terminus negative', observed, (s) => (s.observations.terminus = -1), '/observations/terminus', '-1 is not allowed', 'the terminus position must be a finite number from 0 to 1,000,000 m'],
  ['terminus a string', observed, (s) => (s.observations.terminus = 'snout'), '/observations/terminus', '"snout"', 'a position in metres, or a record [[year a, x m], ...]'],
  ['terminus record years repeated', observed, (s) => (s.observations.terminus[2][0] = -10), '/observations/terminus/2/0', '-10 is not allowed', 'the year of each point of the terminus record must be greater than the year of the point before it (-10 at index 1)'],
  ['terminus record beyond the domain', observed, (s) => (s.observations.terminus[0][1] = 15001), '/observations/terminus/0/1', '15001', 'each terminus position must lie within the domain'],
  ['terminus record point of three numbers', observed, (s) => (s.observations.terminus[1] = [-10, 11350, 5]), '/observations/terminus/1', '[-10,11350,5]', 'exactly two numbers [year a, x m]'],
  ['empty terminus record', observed, (s) => (s.observations.terminus = []), '/observations/terminus', '[]', '1 to 10,000 points'],
  ['elevation change period reversed', observed, (s) => (s.observations.elevationChange.to = -20), '/observations/elevationChange/to', '-20 is not allowed', 'the end year "to" of the elevation change must be later than its start year "from" (-10 a)'],
  ['elevation change period empty', observed, (s) => (s.observations.elevationChange.to = -10), '/observations/elevationChange/to', '-10', 'later than'],
  ['elevation change too fast', observed, (s) => (s.observations.elevationChange.points[1][1] = -150), '/observations/elevationChange/points/1/1', '-150', 'the rate of elevation change must be a finite number from -100 to 100 m a^-1'],
  ['elevation change beyond the domain', observed, (s) => (s.observations.elevationChange.points[3][0] = 15100), '/observations/elevationChange/points/3/0', '15100', 'the x of each elevation-change point must lie within the domain'],
  ['elevation change without points', observed, (s) => delete s.observations.elevationChange.points, '/observations/elevationChange/points', 'missing', '1 to 10,000 points'],
  ['geodetic balance period reversed', observed, (s) => (s.observations.geodeticBalance = { from: 0, to: -10, value: -0.5 }), '/observations/geodeticBalance/to', '-10', 'the end year "to" of the geodetic balance must be later than its start year "from" (0 a)'],
  ['geodetic balance too large', observed, (s) => (s.observations.geodeticBalance.value = 200), '/observations/geodeticBalance/value', '200', 'from -100 to 100 m w.e. a^-1'],
  ['geodetic balance without value', observed, (s) => delete s.observations.geodeticBalance.value, '/observations/geodeticBalance/value', 'missing', 'the geodetic balance must be a finite number'],
  ['geodetic balance Infinity', observed, (s) => (s.observations.geodeticBalance.from = -Infinity), '/observations/geodeticBalance/from', '-Infinity', 'finite number'],
  // Values that JSON cannot carry but JavaScript callers can.
  ['NaN from JavaScript', demo, (s) => (s.ice.n = NaN), '/ice/n', 'NaN is not allowed', 'finite number'],
  ['Infinity from JavaScript', demo, (s) => (s.grid.length = Infinity), '/grid/length', 'Infinity is not allowed', 'finite number'],
  ['-0 where a positive number is needed', demo, (s) => (s.run.years = -0), '/run/years', '-0 is not allowed', 'greater than 0'],
  ['undefined for a required key', demo, (s) => (s.run.years = undefined), '/run/years', 'undefined is not allowed', 'greater than 0'],
];

describe('validateScenario: hard rules', () => {
  it.each(cases)('%s', (_what, base, mutate, path, ...fragments) => {
    const errors = errorsOf(changed(base, mutate));
    const atPath = errors.filter((e) => e.path === path);
    expect(atPath, `errors were: ${errors.map(formatMessage).join(' | ')}`).toHaveLength(1);
    for (const fragment of fragments) expect(atPath[0].message).toContain(fragment);
  });

  it('gives the message in the documented form', () => {
    const errors = errorsOf(changed(demo, (s) => (s.grid.spacing = -50)));
    expect(errors.map(formatMessage)).toEqual([
      '/grid/spacing: -50 is not allowed; the cell spacing must be a finite number of at least 1 m',
    ]);
  });

  it('shows the root as "/" in formatted messages', () => {
    expect(formatMessage({ path: '', message: 'x' })).toBe('/: x');
    expect(formatMessage({ path: '/ice/A', message: 'y' })).toBe('/ice/A: y');
  });

  it('reports a missing key at its own path', () => {
    const errors = errorsOf(changed(demo, (s) => delete s.grid.length));
    expect(errors).toEqual([
      {
        path: '/grid/length',
        message:
          'this required key is missing; the domain length must be a finite number greater than 0 and at most 1,000,000 m',
      },
    ]);
  });

  it('rejects input that is not an object', () => {
    for (const input of [null, 5, 'scenario', [], true]) {
      const errors = errorsOf(input);
      expect(errors).toHaveLength(1);
      expect(errors[0].path).toBe('');
      expect(errors[0].message).toContain('a scenario must be a JSON object with the keys "format", "version"');
    }
  });

  it('reports every error, not just the first', () => {
    const errors = errorsOf(
      changed(demo, (s) => {
        s.version = 2;
        s.grid.spacing = 70;
        s.ice.n = 9;
        s.run.years = -1;
      }),
    );
    expect(errors.map((e) => e.path).sort()).toEqual(['/grid/spacing', '/ice/n', '/run/years', '/version']);
  });

  it('lists at most 100 errors and counts the rest', () => {
    // 10,000 points in falling x: 9,999 errors.
    const errors = errorsOf(changed(demo, (s) => (s.bed = Array.from({ length: 10000 }, (_, i) => [10000 - i, 2000]))));
    expect(errors).toHaveLength(101);
    expect(errors[100]).toEqual({ path: '', message: '9899 further errors not listed; fix the ones above first' });
  });
});

describe('validateScenario: unknown keys', () => {
  const unknownKeyCases: [string, () => Json, (s: Json) => void, string, string][] = [
    ['root', demo, (s) => (s.colour = 'blue'), '/colour', '"format", "version", "name"'],
    ['grid', demo, (s) => (s.grid.spacng = 50), '/grid/spacng', '"length", "spacing"'],
    ['ice', demo, (s) => (s.ice.B = 1), '/ice/B', '"n", "A", "temperature", "enhancement", "density"'],
    ['sliding', demo, (s) => (s.sliding.c = 1), '/sliding/c', '"C", "m"'],
    ['shape factor', demo, (s) => (s.shapeFactor.f = 1), '/shapeFactor/f', '"crossSection"'],
    ['linear balance', demo, (s) => (s.massBalance.points = []), '/massBalance/points', '"model", "ela", "ablationGradient"'],
    ['table balance', tableScenario, (s) => (s.massBalance.ela = 2800), '/massBalance/ela', '"model", "points", "elaSensitivity"'],
    ['degree-day balance', degreeDayScenario, (s) => (s.massBalance.ddf = 3), '/massBalance/ddf', '"ddfSnow", "ddfIce"'],
    ['run', demo, (s) => (s.run.dt = 1), '/run/dt', '"years", "outputEvery"'],
    ['observations', observed, (s) => (s.observations.speed = []), '/observations/speed', '"year", "terminus", "thickness", "surfaceSpeed", "elevationChange", "geodeticBalance"'],
    ['geodetic balance', observed, (s) => (s.observations.geodeticBalance.sigma = 0.2), '/observations/geodeticBalance/sigma', '"from", "to", "value"'],
    ['key needing escapes', demo, (s) => (s.ice['a/b~c'] = 1), '/ice/a~1b~0c', '"n"'],
  ];
  it.each(unknownKeyCases)('%s', (_what, base, mutate, path, allowedKeys) => {
    const errors = errorsOf(changed(base, mutate));
    expect(errors).toHaveLength(1);
    expect(errors[0].path).toBe(path);
    const key = path.split('/').pop()!.replace(/~1/g, '/').replace(/~0/g, '~');
    expect(errors[0].message).toContain(`unknown key ${JSON.stringify(key)} is not allowed`);
    expect(errors[0].message).toContain(allowedKeys);
  });

  it('treats "__proto__" from JSON as an ordinary unknown key', () => {
    const input = JSON.parse(JSON.stringify(demo()).replace('{', '{"__proto__":{"polluted":1},'));
    const errors = errorsOf(input);
    expect(errors.map((e) => e.path)).toEqual(['/__proto__']);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('validateScenario: never throws', () => {
  const hostile: [string, () => unknown][] = [
    ['a cyclic object', () => {
      const s = demo();
      s.grid = s;
      return s;
    }],
    ['a cyclic point list', () => {
      const s = demo();
      s.bed[1] = s.bed;
      return s;
    }],
    ['a getter that throws', () => ({ ...demo(), ice: { get n() { throw new Error('boom'); } } })],
    ['a proxy that throws', () => new Proxy({}, { ownKeys: () => { throw new Error('trap'); }, get: () => { throw new Error('trap'); } })],
    ['a Map', () => new Map([['format', 'firnline-scenario']])],
    ['a Date for the grid', () => ({ ...demo(), grid: new Date(0) })],
    ['a BigInt', () => ({ ...demo(), version: 1n })],
    ['a symbol', () => ({ ...demo(), name: Symbol('x') })],
    ['a function', () => ({ ...demo(), run: () => 1 })],
    ['a million points', () => ({ ...demo(), bed: new Array(1_000_000).fill([0, 0]) })],
    ['a huge string', () => ({ ...demo(), name: 'n'.repeat(5_000_000) })],
    ['an object with 200,000 keys', () => {
      const grid: Record<string, number> = { length: 12000, spacing: 50 };
      for (let i = 0; i < 200_000; i++) grid[`k${i}`] = i;
      return { ...demo(), grid };
    }],
  ];
  it.each(hostile)('handles %s', (_what, make) => {
    const result = validateScenario(make());
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors.length).toBeGreaterThanOrEqual(1);
      expect(result.errors.length).toBeLessThanOrEqual(101);
      for (const e of result.errors) expect(e.message.length).toBeGreaterThan(0);
    }
  });

  it('accepts an object without a prototype', () => {
    const s = Object.assign(Object.create(null), demo());
    expect(validateScenario(s).ok).toBe(true);
  });
});
