/**
 * Valid but physically odd scenarios pass with warnings that name the key and say why.
 */
import { describe, expect, it } from 'vitest';
import { formatMessage, validateScenario, type ValidationMessage } from '../../src/scenario/validateScenario';
import { changed, degreeDayScenario, tableScenario, validScenarios, valleyScenario as demo, type Json } from './scenarioFixtures';

function warningsOf(input: unknown): ValidationMessage[] {
  const result = validateScenario(input);
  if (!result.ok) throw new Error(`expected a valid scenario: ${result.errors.map(formatMessage).join(' | ')}`);
  return result.warnings;
}

type Case = [string, () => Json, (s: Json) => void, string, ...string[]];

const cases: Case[] = [
  ['a very coarse grid', demo, (s) => (s.grid.spacing = 2500), '/grid/spacing', 'only 6 cells'],
  ['a bed that stops short of the domain end', demo, (s) => (s.bed = s.bed.slice(0, 6)), '/bed', 'x = 0 to 11,000 m', '0 to 15,000 m', 'held at'],
  ['a bed that starts inside the domain', demo, (s) => (s.bed[0][0] = 200), '/bed', 'x = 200 to 15,000 m'],
  ['a bed rising down-glacier', degreeDayScenario, (s) => (s.bed = [[0, 1600], [20000, 3600]]), '/bed', 'rises down-glacier', 'from 1600 m at x = 0 to 3600 m'],
  ['a width varying by more than 20 times', demo, (s) => (s.width = [[0, 3000], [15000, 100]]), '/width', 'from 100 to 3000 m', 'factor of 20'],
  ['a cross section without a width', demo, (s) => delete s.width, '/shapeFactor', '"width" is absent'],
  ['a surface entirely below the bed', demo, (s) => (s.surface = [[0, 1000], [15000, 1000]]), '/surface', 'starts ice-free'],
  ['initial ice reaching the domain end', demo, (s) => (s.surface[6][1] = 1800), '/surface', 'reaches the last cell (x = 14,950 m)', 'too short'],
  // Cuffey & Paterson (2010), The Physics of Glaciers, 4th ed., Table 3.4: A for n = 3 spans about
  // 1e-26 (cold ice) to 2.4e-24 Pa^-3 s^-1 (temperate ice); the warning band is 1e-26 to 1e-22.
  ['A below the usual range', demo, (s) => (s.ice.A = 5e-27), '/ice/A', 'A = 5e-27', '1e-26 to 1e-22 Pa^-3 s^-1'],
  ['A above the usual range', demo, (s) => (s.ice.A = 5e-22), '/ice/A', 'A = 5e-22', 'outside the usual range'],
  ['A judged for n = 1', demo, (s) => (s.ice = { n: 1, A: 1e-17 }), '/ice/A', 'for n = 1', '1e-16 to 1e-12'],
  ['temperature with n other than 3', tableScenario, (s) => (s.ice.n = 4), '/ice/temperature', 'calibrated for n = 3', 'n = 4'],
  ['a large enhancement factor', tableScenario, (s) => (s.ice.enhancement = 20), '/ice/enhancement', 'enhancement factor of 20'],
  ['a density denser than pure ice', demo, (s) => (s.ice.density = 950), '/ice/density', '950 kg m^-3', '830 to 917'],
  ['implausibly fast sliding', demo, (s) => (s.sliding.C = 1e-10), '/sliding/C', '100,000 m a^-1', 'faster than any glacier observed'],
  ['negligible sliding', demo, (s) => (s.sliding.C = 1e-20), '/sliding/C', 'negligible', 'C = 0'],
  ['an ELA above the highest bed point', demo, (s) => (s.massBalance.ela = 3400), '/massBalance/ela', 'ELA (3400 m)', 'highest bed point in the domain (3300 m)', 'no accumulation area'],
  ['an ELA below the lowest bed point', demo, (s) => (s.massBalance.ela = 1600), '/massBalance/ela', 'lowest bed point in the domain (1700 m)', 'reach the end of the domain'],
  ['warming lifting the ELA above the bed', demo, (s) => (s.warming = [[0, 0], [150, 5]]), '/warming', 'largest warming of the run (5 K)', 'ELA rises to 3350 m'],
  ['cooling lowering the ELA below the bed', demo, (s) => (s.warming = [[0, 0], [150, -10]]), '/warming', 'largest cooling of the run (-10 K)', 'falls to 1700 m'],
  ['a table with no positive balance on the bed', tableScenario, (s) => (s.massBalance.points = [[2000, -5], [3500, -0.5]]), '/massBalance/points', 'at most -2 m w.e. a^-1', 'no accumulation area'],
  ['a table with positive balance everywhere', tableScenario, (s) => (s.massBalance.points = [[2000, 0.5], [3500, 2]]), '/massBalance/points', 'at least 0.8 m w.e. a^-1', 'end of the domain'],
  ['warming shifting the table above the bed', tableScenario, (s) => (s.warming = [[0, 0], [50, 5]]), '/warming', 'shifts up by 450 m'],
  ['a table falling with elevation', tableScenario, (s) => (s.massBalance.points[2][1] = -1), '/massBalance/points/2/1', 'falls with elevation', 'from 0 to -1'],
  ['ice melting slower than snow', degreeDayScenario, (s) => (s.massBalance.ddfIce = 2), '/massBalance/ddfIce', '(2) is smaller than that for snow (3'],
  ['precipitation negative low on the bed', degreeDayScenario, (s) => (s.massBalance.precipitationGradient = 0.001), '/massBalance/precipitationGradient', 'negative at 1600 m', '-0.4 times', 'taken as zero'],
  ['a degree-day climate too warm for ice', degreeDayScenario, (s) => (s.massBalance.meanTemperature = 10), '/massBalance', 'degree-day balance is at most', '(1600 to 3600 m)', 'no accumulation area'],
  ['a degree-day climate cold everywhere', degreeDayScenario, (s) => (s.massBalance.meanTemperature = -30), '/massBalance', 'degree-day balance is at least', 'end of the domain'],
  ['warming melting the degree-day accumulation area', degreeDayScenario, (s) => (s.warming = [[0, 0], [100, 15]]), '/warming', 'largest warming of the run (15 K)', 'degree-day balance is negative'],
  ['cooling making the degree-day balance positive everywhere', degreeDayScenario, (s) => (s.warming = [[0, 0], [100, -30]]), '/warming', 'largest cooling of the run (-30 K)', 'positive'],
  ['a run shorter than two output intervals', demo, (s) => (s.run.outputEvery = 250), '/run/outputEvery', 'run of 400 a gives only one output after the start'],
];

describe('validateScenario: warnings', () => {
  it.each(cases)('%s', (_what, base, mutate, path, ...fragments) => {
    const warnings = warningsOf(changed(base, mutate));
    const atPath = warnings.filter((w) => w.path === path);
    expect(atPath, `warnings were: ${warnings.map(formatMessage).join(' | ')}`).toHaveLength(1);
    for (const fragment of fragments) expect(atPath[0].message).toContain(fragment);
  });

  it('gives no warnings for the fixtures, which are ordinary glaciers', () => {
    for (const s of validScenarios()) expect(warningsOf(s)).toEqual([]);
  });

  it('gives no warnings with errors (they are checked once the errors are fixed)', () => {
    const result = validateScenario(changed(demo, (s) => {
      s.version = 2;
      s.massBalance.ela = 9000;
    }));
    expect(result.ok).toBe(false);
    expect(result.warnings).toEqual([]);
  });
});
