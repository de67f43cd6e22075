/**
 * Frontal ablation into a lake at the ice front (physics/frontalAblation.ts): the water-depth
 * relation u_c = c D_w (Brown, Meier & Post 1982, USGS Prof. Paper 1258-C; freshwater
 * coefficients of Funk & Röthlisberger 1989 and Warren & Kirkbride 2003, from memory), its exact
 * split step, the mass budget with it in both schemes, and its direction on a glacier.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { exposedLakes, fillLevels } from '../../src/model/analysis/exposedLakes';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { applyFrontalAblation, frontalAblationFlux, iceFront } from '../../src/model/physics/frontalAblation';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { FlowlineSimulation } from '../../src/model/simulation';
import { validateScenario } from '../../src/scenario/validateScenario';
import { seriesCsv } from '../../src/outputs/csvWriters';
import { summaryJson } from '../../src/outputs/summaryJson';

/**
 * Hand-built lake: 10 cells of 100 m, width 200 m. The bed falls to 880 m at cell 5 and rises to a
 * lip of 950 m at cell 7, so water stands at 950 m over cells 4-6 (depths 50, 70, 50 m). Ice
 * 100 m thick fills cells 0-4; cell 5 is the first ice-free cell: D_w = 950 - 880 = 70 m.
 */
const bed = Float64Array.from([1100, 1050, 1000, 950, 900, 880, 900, 950, 940, 900]);
const lakeGrid = {
  cellCount: 10,
  spacing: 100,
  x: Float64Array.from(bed, (_, i) => (i + 0.5) * 100),
  bed,
  widthAtCells: new Float64Array(10).fill(200),
};
const iceToCell4 = () => Float64Array.from(bed, (_, i) => (i <= 4 ? 100 : 0));

describe('the water depth at the front', () => {
  it('is the water level minus the bed at the first ice-free cell: 950 - 880 = 70 m, the lake exposedLakes finds', () => {
    const thickness = iceToCell4();
    const front = iceFront(lakeGrid, thickness);
    expect(front).toEqual({ cell: 4, waterDepth: 70 });
    const [lake] = exposedLakes(lakeGrid, thickness);
    expect(lake.touchesIce).toBe(true);
    expect(lake.start).toBe(500);
    expect(lake.waterLevel - bed[5]).toBe(front.waterDepth);
  });

  it('is 0 without a lake (a bed falling down-valley) and when the ice reaches the end of the domain', () => {
    const falling = { ...lakeGrid, bed: Float64Array.from(bed, (_, i) => 1100 - 30 * i) };
    expect(iceFront(falling, iceToCell4()).waterDepth).toBe(0);
    expect(frontalAblationFlux(falling, iceToCell4(), 27)).toBe(0);
    expect(iceFront(lakeGrid, new Float64Array(10).fill(100)).waterDepth).toBe(0);
    const thickness = iceToCell4();
    expect(applyFrontalAblation(falling, thickness, 27, 1, fillLevels(falling.bed))).toBe(0);
    expect(thickness).toEqual(iceToCell4());
  });
});

describe('the split step (worked examples, to round-off)', () => {
  it('removes c D_w H w per year: c = 1 a^-1, D_w = 70 m, H = 100 m, w = 200 m: 1.4e6 m^3, 70 % of the terminus cell', () => {
    const thickness = iceToCell4();
    expect(frontalAblationFlux(lakeGrid, thickness, 1)).toBe(1 * 70 * 100 * 200);
    const removed = applyFrontalAblation(lakeGrid, thickness, 1, 1, fillLevels(bed));
    expect(removed).toBeCloseTo(1.4e6, 6);
    expect(thickness[4]).toBeCloseTo(30, 12);
    expect(Array.from(thickness.subarray(0, 4))).toEqual([100, 100, 100, 100]);
  });

  it('in a trapezoidal valley section calves c D_w A(H): floor 200 m, widening 100 m (k = 1), A(100) = 200 x 100 + 100^2 / 2 = 25,000 m^2; 70 % of it goes, and the thickness follows the area', () => {
    const sectioned = { ...lakeGrid, section: { shape: 'trapezoidal' as const, widening: 100 } };
    const thickness = iceToCell4();
    expect(frontalAblationFlux(sectioned, thickness, 1)).toBeCloseTo(70 * 25_000, 6);
    const removed = applyFrontalAblation(sectioned, thickness, 1, 1, fillLevels(bed));
    expect(removed).toBeCloseTo(0.7 * 25_000 * 100, 6);
    // 7500 m^2 left: H^2 / 2 + 200 H = 7500, H = -200 + sqrt(200^2 + 15000).
    expect(thickness[4]).toBeCloseTo(-200 + Math.sqrt(40_000 + 15_000), 10);
  });

  it('hands the rest of the step to the next cell: c = 2, the terminus cell empties after 100/140 a, then D_w = 50 m for 2/7 a', () => {
    const thickness = iceToCell4();
    const byCell = new Float64Array(10);
    const removed = applyFrontalAblation(lakeGrid, thickness, 2, 1, fillLevels(bed), byCell);
    // Cell 4: 100 m x 200 m x 100 m = 2e6 m^3 in 5/7 a; cell 3 (D_w = 950 - 900 = 50 m, u = 100 m/a): 2/7 of 2e6 m^3.
    expect(byCell[4]).toBeCloseTo(2e6, 6);
    expect(byCell[3]).toBeCloseTo((2 / 7) * 2e6, 6);
    expect(removed).toBeCloseTo(2e6 * (1 + 2 / 7), 6);
    expect(thickness[4]).toBe(0);
    expect(thickness[3]).toBeCloseTo(100 * (5 / 7), 10);
  });

  it('never removes more than the ice a cell holds and never leaves negative thickness (c = 100, 10 a)', () => {
    const thickness = iceToCell4();
    const removed = applyFrontalAblation(lakeGrid, thickness, 100, 10, fillLevels(bed));
    expect(Math.min(...thickness)).toBeGreaterThanOrEqual(0);
    // Cells 3 and 4 lie in the basin below the lip and calve away; cell 2 (bed 1000 m) is above the water.
    expect(removed).toBeCloseTo(2 * 2e6, 6);
    expect(thickness[2]).toBe(100);
  });
});

/** A valley with an overdeepening at 8-11 km (the example's bed, reduced): a lake forms as the ice retreats. */
const example = JSON.parse(readFileSync(new URL('../../examples/snorvelt-lake.json', import.meta.url), 'utf8')) as Scenario;
const withCoefficient = (s: Scenario, c: number): Scenario => ({ ...s, frontalAblation: { waterDepthCoefficient: c } });

describe('frontal ablation in a run', () => {
  for (const scheme of ['implicit', 'explicit'] as const) {
    it(`the budget closes with frontal ablation on (${scheme}; relative residual < 1e-9) and calving happened`, () => {
      const scenario: Scenario = { ...withCoefficient(example, 5), numerics: { scheme }, run: { years: 160, outputEvery: 20 } };
      const report = runScenario(scenario);
      const b = report.summary.massBudget;
      expect(b.frontalAblation).toBeGreaterThan(1e6);
      expect(b.relativeResidual).toBeLessThan(1e-9);
      expect(Math.abs(b.finalVolume - b.initialVolume - b.appliedBalance + b.outflow + b.frontalAblation)).toBeLessThan(1e-9 * b.initialVolume);
      expect(report.frames.some((f) => f.numbers.frontalAblation > 0)).toBe(true);
    });
  }

  it('books the split step: the simulation budget equals the volume lost beyond the surface balance', () => {
    const model = createFlowlineModel({ ...withCoefficient(example, 5), debris: undefined });
    const simulation = new FlowlineSimulation(model, model.initialThickness, () => 2.5);
    simulation.advanceTo(100);
    const b = simulation.massBudget();
    expect(b.frontalAblation).toBeGreaterThan(0);
    expect(Math.abs(b.residual)).toBeLessThan(1e-9 * b.initialVolume);
  });

  it('is zero without the key and with c = 0 (same run byte for byte)', () => {
    const short: Scenario = { ...example, run: { years: 150, outputEvery: 50 } };
    const without = runScenario({ ...short, frontalAblation: undefined });
    const zero = runScenario(withCoefficient(short, 0));
    expect(zero.summary.massBudget.frontalAblation).toBe(0);
    expect(zero.frames.map((f) => f.numbers)).toEqual(without.frames.map((f) => f.numbers));
  });

  it('direction: the lake-terminating glacier retreats faster with c > 0 (never longer, shorter while in the lake)', () => {
    const calving = runScenario(withCoefficient(example, 2.5));
    const none = runScenario(withCoefficient(example, 0));
    calving.frames.forEach((f, k) => expect(f.numbers.terminus).toBeLessThanOrEqual(none.frames[k].numbers.terminus));
    const at = (r: typeof calving, year: number) => r.frames.find((f) => f.time === year)!.numbers.terminus;
    expect(at(calving, 150)).toBeLessThan(at(none, 150) - 1000);
  });
});

describe('frontal ablation in the outputs', () => {
  it('summary.json books it in the mass budget; series.csv has the rate since the previous output, which sums to it', () => {
    const report = runScenario({ ...withCoefficient(example, 5), run: { years: 200, outputEvery: 1 } });
    const summary = summaryJson({
      firnlineVersion: 'test',
      scenarioName: example.name,
      spinupRequested: false,
      run: report.summary,
      validatorWarnings: [],
      outputTimes: report.frames.map((f) => f.time),
    });
    expect(summary.massBudget.frontalAblation).toBe(report.summary.massBudget.frontalAblation);
    const lines = seriesCsv(report.frames.map((f) => f.numbers)).trim().split('\n');
    const column = lines[0].split(',').indexOf('frontal_ablation_m3_a');
    expect(column).toBe(10);
    // Annual outputs: each row's rate [m^3 a^-1] over one year; their sum is the budget's volume (7 digits written).
    const total = lines.slice(1).reduce((sum, line) => sum + Number(line.split(',')[column]), 0);
    expect(total / report.summary.massBudget.frontalAblation).toBeCloseTo(1, 5);
    expect(Number(lines[1].split(',')[column])).toBe(0);
  });
});

describe('the example examples/snorvelt-lake.json', () => {
  it('validates and runs; how far and how fast it retreats with and without frontal ablation and debris', () => {
    const checked = validateScenario(example);
    expect(checked.ok).toBe(true);
    const cases = {
      'debris + calving (the example)': example,
      'debris, no calving': { ...example, frontalAblation: undefined },
      'calving, bare ice': { ...example, debris: undefined },
      'bare ice, no calving': { ...example, debris: undefined, frontalAblation: undefined },
    };
    const results = Object.entries(cases).map(([label, scenario]) => {
      const report = runScenario(scenario);
      const frames = report.frames;
      const start = frames[0].numbers.terminus;
      const end = frames[frames.length - 1].numbers.terminus;
      // First output year with the terminus up-valley of the overdeepening's deepest point (9.5 km).
      const inBasin = frames.find((f) => f.numbers.terminus < 9500)?.time ?? Number.NaN;
      console.info(
        `snorvelt-lake ${label}: terminus ${start} -> ${end} m; up-valley of 9.5 km by year ${inBasin}; ` +
          `calved ${report.summary.massBudget.frontalAblation.toExponential(3)} m^3; residual ${report.summary.massBudget.relativeResidual.toExponential(1)}`,
      );
      expect(report.summary.massBudget.relativeResidual).toBeLessThan(1e-9);
      return { start, end, inBasin };
    });
    const [example_, noCalving] = results;
    expect(example_.inBasin).toBeLessThan(noCalving.inBasin);
  });
});
