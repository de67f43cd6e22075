import { describe, expect, it } from 'vitest';
import { validateExperiment } from '../../src/experiment/validateExperiment';
import { validateInversionInput } from '../../src/scenario/validateInversionInput';
import { parseScenarioText, validateScenario } from '../../src/scenario/validateScenario';
import { DEMO_TEXT, demo, type Json } from './scenarioFixtures';

/** The demo as a file written before the rename: massBalance.gradient for ablationGradient. */
function oldDemoText(): string {
  const text = DEMO_TEXT.replace('"ablationGradient"', '"gradient"');
  expect(text).not.toBe(DEMO_TEXT);
  return text;
}

describe('renamed key: massBalance.gradient is now ablationGradient', () => {
  it('an old file opens, under the new name in the same place, with a warning naming both paths', () => {
    const result = parseScenarioText(oldDemoText());
    if (!result.ok) throw new Error(result.errors[0].message);
    const mb = result.scenario.massBalance as Json;
    expect(mb.ablationGradient).toBe(demo().massBalance.ablationGradient);
    expect('gradient' in mb).toBe(false);
    // Key order kept: the scenario is written back as it was read, with the new name.
    expect(Object.keys(mb)).toEqual(Object.keys(demo().massBalance));
    expect(result.scenario).toEqual(demo());
    const note = result.warnings.find((w) => w.path === '/massBalance/ablationGradient');
    expect(note?.message).toMatch(/\/massBalance\/gradient is the old name of \/massBalance\/ablationGradient/);
  });

  it('does not change the object it was given', () => {
    const old = JSON.parse(oldDemoText());
    const copy = structuredClone(old);
    expect(validateScenario(old).ok).toBe(true);
    expect(old).toEqual(copy);
  });

  it('refuses a file that gives both names, naming both paths', () => {
    const both = demo();
    both.massBalance.gradient = 0.005;
    const result = validateScenario(both);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors).toEqual([
      {
        path: '/massBalance/gradient',
        message:
          'both /massBalance/gradient (the old name) and /massBalance/ablationGradient are given; keep only /massBalance/ablationGradient, the new name of the same value',
      },
    ]);
  });

  it('leaves "gradient" in other balance models to the schema (refused there as an unknown key)', () => {
    const table = demo();
    table.massBalance = { model: 'table', points: [[2000, -3], [3500, 1]], gradient: 0.007 };
    const result = validateScenario(table);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.errors[0].path).toMatch(/^\/massBalance/);
  });

  it('the inversion input reads the old name too', () => {
    const input = JSON.parse(oldDemoText());
    input.surface = [[0, 3500], [input.grid.length, 1000]];
    input.observations = { terminus: input.grid.length / 2 };
    delete input.bed;
    const result = validateInversionInput(input);
    if (!result.ok) throw new Error(result.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
    expect((result.scenario.massBalance as Json).ablationGradient).toBe(demo().massBalance.ablationGradient);
    expect(result.warnings.map((w) => w.path)).toContain('/massBalance/ablationGradient');
  });
});

describe('renamed key in experiment files', () => {
  const experiment = (extra: Json): Json => ({ format: 'firnline-experiment', version: 1, base: JSON.parse(oldDemoText()), ...extra });

  it('an old experiment opens: base, variant patch, sweep and ensemble pointers under the new name', () => {
    const result = validateExperiment(
      experiment({
        variants: [{ name: 'steep', set: { massBalance: { gradient: 0.009 } } }],
        sweep: { '/massBalance/gradient': [0.006, 0.008] },
      }),
    );
    if (!result.ok) throw new Error(result.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
    expect(Object.keys(result.experiment.sweep!)).toEqual(['/massBalance/ablationGradient']);
    expect(result.experiment.variants![0].set).toEqual({ massBalance: { ablationGradient: 0.009 } });
    expect(result.members.map((m) => (m.scenario.massBalance as Json).ablationGradient)).toEqual([0.006, 0.008]);
    for (const m of result.members) expect('gradient' in m.scenario.massBalance).toBe(false);

    const sampled = validateExperiment(
      experiment({ ensemble: { members: 2, seed: 1, parameters: { '/massBalance/gradient': { distribution: 'uniform', min: 0.006, max: 0.008 } } } }),
    );
    if (!sampled.ok) throw new Error(sampled.errors.map((e) => `${e.path}: ${e.message}`).join('\n'));
    for (const m of sampled.members) {
      const g = (m.scenario.massBalance as Json).ablationGradient;
      expect(g).toBeGreaterThanOrEqual(0.006);
      expect(g).toBeLessThanOrEqual(0.008);
    }
  });

  it('refuses a sweep that names one value by both names, and a base with both', () => {
    const result = validateExperiment(experiment({ sweep: { '/massBalance/gradient': [0.006], '/massBalance/ablationGradient': [0.008] } }));
    expect(result.ok).toBe(false);
    if (!result.ok) {
      expect(result.errors[0].path).toBe('/sweep/~1massBalance~1gradient');
      expect(result.errors[0].message).toMatch(/both "\/massBalance\/gradient" \(the old name\) and "\/massBalance\/ablationGradient" are given/);
    }
    const both = experiment({});
    both.base.massBalance.ablationGradient = 0.008;
    const refused = validateExperiment(both);
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.errors[0].path).toBe('/base/massBalance/gradient');
  });
});
