/**
 * profiles.csv's surface_width_m, read back from the text the writers make (the command line and
 * the browser's downloads share them):
 *  - trapezoidal valley: the surface is the floor plus k H, k = widening / 100 m (elementary
 *    geometry of straight flanks, physics/valleySection.ts), for the thickness written beside it;
 *  - the booked balance summed as w_s b dx, in ice equivalent, over each output interval is the
 *    volume change in series.csv (continuity integrated over the glacier, e.g. Cuffey & Paterson
 *    2010, section 8.4; no ice leaves this valley). From the unrounded fields to the 1e-9 of the
 *    gross accumulation of the section budget test (test/verification/valleySection.test.ts);
 *    from the CSV to its 7-figure rounding;
 *  - without a section (fixed or unit width) the column is width_m, character for character.
 */
import { csvParse } from 'd3';
import { describe, expect, it } from 'vitest';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { runOutputs } from '../../src/outputs/runOutputs';
import { validateScenario } from '../../src/scenario/validateScenario';

const WIDENING = 300;
const K = WIDENING / 100;
const DX = 50;

const valley = {
  format: 'firnline-scenario',
  version: 1,
  name: 'Skarnhollow trough (invented)',
  grid: { length: 8000, spacing: DX },
  bed: [[0, 3000], [2000, 2700], [3000, 2640], [3500, 2660], [4000, 2600], [4050, 2450], [8000, 2000]],
  width: [[0, 500], [8000, 150]],
  shapeFactor: { crossSection: 'rectangular' },
  ice: { n: 3, A: 2.4e-24 },
  sliding: { C: 2e-14, m: 3 },
  massBalance: { model: 'linear', ela: 2850, ablationGradient: 0.008, accumulationGradient: 0.005, maxAccumulation: 2 },
  warming: [[0, -1], [150, -1], [300, 2.5]],
  run: { years: 300, outputEvery: 25 },
};

function valid(input: unknown): Scenario {
  const result = validateScenario(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.scenario;
}

function written(scenario: Scenario) {
  const report = runScenario(scenario);
  const outputs = runOutputs(report, { scenario, firnlineVersion: 'test', validatorWarnings: [] });
  return { report, profiles: csvParse(outputs.profilesCsv), series: csvParse(outputs.seriesCsv) };
}

describe('surface_width_m in a trapezoidal valley (widening 300 m: k = 3)', () => {
  const { report, profiles, series } = written(valid({ ...valley, section: { shape: 'trapezoidal', widening: WIDENING } }));
  const times = series.map((r) => Number(r.t_yr));
  const cells = report.model.grid.cellCount;
  const rowsAt = (k: number) => profiles.slice(k * cells, (k + 1) * cells);

  it('is the floor plus k H for the written thickness (to the 7-figure rounding), wider than the floor under ice', () => {
    expect(profiles).toHaveLength(cells * times.length);
    let wider = 0;
    for (const row of profiles) {
      const floor = Number(row.width_m);
      const H = Number(row.thickness_m);
      const surface = Number(row.surface_width_m);
      expect(Math.abs(surface - (floor + K * H))).toBeLessThanOrEqual(1e-6 * surface);
      if (H > 1) {
        expect(surface).toBeGreaterThan(floor);
        wider++;
      } else if (H === 0) expect(row.surface_width_m).toBe(row.width_m);
    }
    expect(wider).toBeGreaterThan(times.length * 20);
  });

  it('sum of w_s b dx over each interval is the volume change in series.csv: 1e-9 of the gross accumulation unrounded, 1e-6 of sum |w_s b dx| from the CSV', () => {
    const budget = report.summary.massBudget;
    expect(budget.outflow).toBe(0);
    const iceToWe = report.model.iceToWaterEquivalent;
    let largestChange = 0;
    for (let k = 1; k < times.length; k++) {
      const interval = times[k] - times[k - 1];
      const volumeChange = Number(series[k].volume_m3) - Number(series[k - 1].volume_m3);
      largestChange = Math.max(largestChange, Math.abs(volumeChange));
      // The frame's own fields, before the CSV rounds them.
      const fields = report.frames[k].fields;
      let exact = 0;
      for (let i = 0; i < cells; i++) exact += (fields.balance[i] / iceToWe) * fields.surfaceWidth[i] * DX * interval;
      expect(Math.abs(exact - volumeChange)).toBeLessThanOrEqual(1e-9 * budget.grossAccumulation);
      // The CSV text: each term carries the 7-figure rounding of width and balance (2 x 5e-7).
      let fromCsv = 0;
      let gross = 0;
      for (const row of rowsAt(k)) {
        const term = (Number(row.balance_mwe_a) / iceToWe) * Number(row.surface_width_m) * DX * interval;
        fromCsv += term;
        gross += Math.abs(term);
      }
      expect(Math.abs(fromCsv - volumeChange)).toBeLessThanOrEqual(1e-6 * gross);
    }
    // The check has something to check: the glacier grows and shrinks by large amounts.
    expect(largestChange).toBeGreaterThan(1e6);
  });
});

describe.each([
  ['fixed width', valley],
  ['unit width', { ...valley, width: undefined }],
])('surface_width_m without a section (%s)', (_label, input) => {
  it('is width_m, character for character, in every row', () => {
    const { profiles } = written(valid(input));
    expect(profiles.length).toBeGreaterThan(0);
    for (const row of profiles) expect(row.surface_width_m).toBe(row.width_m);
    if (input.width === undefined) expect(new Set(profiles.map((r) => r.width_m))).toEqual(new Set(['1']));
  });
});
