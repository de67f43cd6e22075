import { describe, expect, it } from 'vitest';
import { OUTCOMES_HEADER } from '../../../src/outputs/experimentCsv';
import type { Experiment } from '../../../src/experiment/experimentSchema';
import { validateExperiment, type ValidExperiment } from '../../../src/experiment/validateExperiment';
import type { Scenario } from '../../../src/model/scenario';
import { demoScenario } from '../../../src/state/scenarioStore';
import { newExperiment } from '../../../src/state/experimentStore';
import { ladderValues, parameterSweep, spread, sweepValues, warmingLadder } from '../../../src/ui/experiments/experimentSets';
import { describePatch } from '../../../src/ui/experiments/describePatch';
import { outcomeColumns, sortRows, type OutcomeRowData } from '../../../src/ui/experiments/outcomeColumns';
import { shortNumber, variantPatch, warmingName } from '../../../src/ui/experiments/variantFields';

const base = demoScenario;
/** The sets read the base of an experiment the validator accepted, as the store holds it. */
function checked(experiment: Experiment): ValidExperiment {
  const result = validateExperiment(experiment);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.experiment;
}
const fromDemo = (): ValidExperiment => checked(newExperiment(base));
const withTemperature: Scenario = { ...base, ice: { n: 3, temperature: -2 } };

describe('variant fields', () => {
  it('builds a merge patch from the typed values and leaves the rest of the base alone', () => {
    const patch = variantPatch(base, { warmingEnd: 2, warmingYear: 50, elaShift: 120, rateFactor: 1.2e-24, slidingC: 0 });
    expect(patch).toEqual({
      ok: true,
      set: { warming: [[0, 0], [50, 2]], massBalance: { ela: 2900 }, ice: { A: 1.2e-24 }, sliding: { C: 0 } },
    });
    expect(base.massBalance).toMatchObject({ model: 'linear', ela: 2780 });
  });

  it('replaces a temperature-based rate factor and adds sliding with m = 3 where the base has none', () => {
    const { sliding: _s, ...noSliding } = withTemperature;
    const patch = variantPatch(noSliding as Scenario, { rateFactor: 2.4e-24, slidingC: 1e-14 });
    expect(patch).toEqual({ ok: true, set: { ice: { A: 2.4e-24, temperature: null, enhancement: null }, sliding: { C: 1e-14, m: 3 } } });
  });

  it('names the field and what is allowed when the validator refuses a value', () => {
    const tooWarm = variantPatch(base, { warmingEnd: 99, warmingYear: 80 });
    expect(tooWarm.ok).toBe(false);
    if (!tooWarm.ok) {
      expect(tooWarm.errors[0].field).toBe('Warming reached');
      expect(tooWarm.errors[0].message).toMatch(/99 is not allowed/);
      expect(tooWarm.errors[0].message).toMatch(/50/);
    }
    const negativeA = variantPatch(base, { rateFactor: -1 });
    expect(negativeA.ok || negativeA.errors[0].field).toBe('Rate factor A');
    const lonely = variantPatch(base, { warmingEnd: 1 });
    expect(lonely).toEqual({ ok: false, errors: [{ field: 'Reached by year', message: expect.stringMatching(/needs a value too/) }] });
    expect(variantPatch(base, { warmingEnd: 1, warmingYear: 0 })).toMatchObject({ ok: false, errors: [{ field: 'Reached by year' }] });
    expect(variantPatch(base, {})).toMatchObject({ ok: false, errors: [{ field: 'Variant', message: expect.stringMatching(/changes nothing/) }] });
    const table: Scenario = { ...base, massBalance: { model: 'table', points: [[2000, -3], [3500, 1]] } };
    expect(variantPatch(table, { elaShift: 50 })).toMatchObject({ ok: false, errors: [{ field: 'ELA shift', message: expect.stringMatching(/linear mass-balance model.*"table"/) }] });
  });

  it('writes short names without binary noise', () => {
    expect(warmingName(1, 80)).toBe('+1 K by year 80');
    expect(warmingName(0.1 + 0.2, 80)).toBe('+0.3 K by year 80');
    expect(warmingName(-0.5, 40)).toBe('−0.5 K by year 40');
    expect(shortNumber(2.4e-24)).toBe('2.4e-24');
    expect(shortNumber(2780)).toBe('2780');
  });

  it('describes a patch in one line', () => {
    expect(describePatch({ warming: [[0, 0], [80, 1]], ice: { A: 1e-24, temperature: null } })).toBe('warming = [[0,0],[80,1]]; ice.A = 1e-24; ice.temperature removed');
  });
});

describe('common sets', () => {
  it('ladder values step without accumulated rounding', () => {
    expect(ladderValues(0, 1, 0.1)).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
    expect(ladderValues(1, 3, 1)).toEqual([1, 2, 3]);
    expect(ladderValues(1, 2.5, 1)).toEqual([1, 2]);
  });

  it('a warming ladder adds one valid variant per rung, named by its warming', () => {
    const made = warmingLadder(fromDemo(), { fromK: 1, toK: 3, stepK: 1, year: 80 });
    if (!made.ok) throw new Error(JSON.stringify(made.errors));
    expect(made.experiment.variants).toEqual([
      { name: '+1 K by year 80', set: { warming: [[0, 0], [80, 1]] } },
      { name: '+2 K by year 80', set: { warming: [[0, 0], [80, 2]] } },
      { name: '+3 K by year 80', set: { warming: [[0, 0], [80, 3]] } },
    ]);
    const checked = validateExperiment(made.experiment);
    expect(checked.ok && checked.members.map((m) => m.name)).toEqual(['1_+1-K-by-year-80', '2_+2-K-by-year-80', '3_+3-K-by-year-80']);
  });

  it('refuses a ladder with a bad step or order, or beyond the variant limit, naming the field', () => {
    expect(warmingLadder(fromDemo(), { fromK: 1, toK: 3, stepK: 0, year: 80 })).toMatchObject({ ok: false, errors: [{ field: 'Step' }] });
    expect(warmingLadder(fromDemo(), { fromK: 3, toK: 1, stepK: 1, year: 80 })).toMatchObject({ ok: false, errors: [{ field: 'To' }] });
    expect(warmingLadder(fromDemo(), { fromK: -50, toK: 50, stepK: 0.01, year: 80 })).toMatchObject({
      ok: false,
      errors: [{ field: 'Ladder', message: '10,001 variants are not allowed; an experiment has at most 1000 variants' }],
    });
    expect(warmingLadder(fromDemo(), { fromK: 40, toK: 60, stepK: 10, year: 80 })).toMatchObject({ ok: false, errors: [{ field: 'Warming reached', message: expect.stringMatching(/60 is not allowed/) }] });
  });

  it('a sweep sets a JSON Pointer sweep with evenly spaced values (logarithmic by powers)', () => {
    expect(sweepValues(1e-24, 1e-22, 3, 'logarithmic')).toEqual([1e-24, 1e-23, 1e-22]);
    expect(sweepValues(2680, 2880, 5, 'linear')).toEqual([2680, 2730, 2780, 2830, 2880]);
    const made = parameterSweep(fromDemo(), { parameter: 'ELA', from: 2680, to: 2880, count: 3, spacing: 'linear' });
    if (!made.ok) throw new Error(JSON.stringify(made.errors));
    expect(made.experiment.sweep).toEqual({ '/massBalance/ela': [2680, 2780, 2880] });
    expect(validateExperiment(made.experiment).ok).toBe(true);
  });

  it('refuses sweeps the base cannot take, or too many members, with what is allowed', () => {
    const onTemperature = checked(newExperiment(withTemperature));
    expect(parameterSweep(onTemperature, { parameter: 'A', from: 1e-24, to: 1e-23, count: 3, spacing: 'logarithmic' })).toMatchObject({
      ok: false,
      errors: [{ field: 'Rate factor A', message: expect.stringMatching(/gives the ice temperature, not A/) }],
    });
    expect(parameterSweep(fromDemo(), { parameter: 'C', from: 0, to: 1e-14, count: 3, spacing: 'logarithmic' })).toMatchObject({
      ok: false,
      errors: [{ field: 'From', message: expect.stringMatching(/logarithmic spacing needs both ends above 0/) }],
    });
    expect(parameterSweep(fromDemo(), { parameter: 'A', from: 1e-24, to: 1e-23, count: 1, spacing: 'linear' })).toMatchObject({ ok: false, errors: [{ field: 'Values' }] });
    const ladder = warmingLadder(fromDemo(), { fromK: 0, toK: 9.9, stepK: 0.1, year: 80 });
    if (!ladder.ok) throw new Error('ladder refused');
    expect(parameterSweep(checked(ladder.experiment), { parameter: 'A', from: 1e-24, to: 1e-23, count: 101, spacing: 'linear' })).toMatchObject({
      ok: false,
      errors: [{ field: 'Sweep', message: 'this would make 10,100 members; an experiment has at most 10,000 (variants, or 1, times the sweep values)' }],
    });
  });

  it('counts the ensemble members when a set would make too many members', () => {
    const withEnsemble = { ...fromDemo(), ensemble: { members: 200, seed: 1, parameters: { '/ice/A': { distribution: 'lognormal' as const, median: 2.4e-24, sigma: 0.3 } } } };
    expect(parameterSweep(withEnsemble, { parameter: 'A', from: 1e-24, to: 1e-23, count: 60, spacing: 'linear' })).toMatchObject({
      ok: false,
      errors: [{ field: 'Sweep', message: 'this would make 12,000 members; an experiment has at most 10,000 (variants, or 1, times the sweep values, times the ensemble members)' }],
    });
    expect(parameterSweep(withEnsemble, { parameter: 'A', from: 1e-24, to: 1e-23, count: 50, spacing: 'linear' })).toMatchObject({ ok: true });
  });

  it('a spread adds low, central and high variants in order, and refuses them out of order', () => {
    const made = spread(fromDemo(), { quantity: 'elaShift', low: 50, central: 100, high: 200, year: 80 });
    if (!made.ok) throw new Error(JSON.stringify(made.errors));
    expect(made.experiment.variants?.map((v) => [v.name, v.set])).toEqual([
      ['low: ELA +50 m', { massBalance: { ela: 2830 } }],
      ['central: ELA +100 m', { massBalance: { ela: 2880 } }],
      ['high: ELA +200 m', { massBalance: { ela: 2980 } }],
    ]);
    expect(spread(fromDemo(), { quantity: 'warming', low: 3, central: 2, high: 4, year: 80 })).toMatchObject({ ok: false, errors: [{ field: 'Spread' }] });
  });
});

describe('outcomes table columns', () => {
  const row = (index: number, lengthChange: number | null): OutcomeRowData => ({
    index,
    name: `m${index}`,
    status: lengthChange === null ? 'failed' : 'ok',
    outcome: lengthChange === null ? null : ({ lengthChange, volumeStart: 2e9, endsInSteadyState: false } as never),
    message: lengthChange === null ? 'numerical failure' : '',
  });

  it('are the columns of outcomes.csv in order, with units', () => {
    const columns = outcomeColumns(false);
    expect(columns.map((c) => c.key)).toEqual([...OUTCOMES_HEADER]);
    expect(columns.find((c) => c.key === 'volume_start_m3')!.title).toBe('Volume at year 0 (km³)');
    expect(columns.find((c) => c.key === 'volume_start_m3')!.value(row(0, -10))).toBe(2);
    expect(outcomeColumns(true).find((c) => c.key === 'volume_start_m3')!.title).toBe('Volume at year 0 (10⁶ m³ per m of width)');
  });

  it('sort numbers either way, failed members always last, ties in member order', () => {
    const column = outcomeColumns(false).find((c) => c.key === 'length_change_m')!;
    const rows = [row(0, -300), row(1, null), row(2, -100), row(3, -300)];
    expect(sortRows(rows, column, 'ascending').map((r) => r.index)).toEqual([0, 3, 2, 1]);
    expect(sortRows(rows, column, 'descending').map((r) => r.index)).toEqual([2, 0, 3, 1]);
  });
});
