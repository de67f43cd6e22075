/**
 * The valley section in the whole engine (src/model/physics/valleySection.ts, used by the flux,
 * both steppers, the budget and the diagnostics):
 *  - direction and size: ice that only melts, at b = -2 m a^-1 for 50 years, thins by exactly
 *    100 m whatever the section, and loses the section's area between the two surfaces,
 *    integral of w_s dH = w0 dH + k/2 (H1^2 - H0^2) for a trapezoid (elementary integration),
 *    2 (w_s1^3 - w_s0^3) / (3p) for the filled parabola; its surface narrows to w0 + k H1;
 *  - a rectangular section is the fixed-width model;
 *  - the mass budget closes (finite-volume flux form, e.g. LeVeque 2002 ch. 4), and the booked
 *    balance summed as w_s b dx over the outputs gives the volume change.
 */
import { describe, expect, it } from 'vitest';
import { cellSurfaceWidth } from '../../src/model/cellSection';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { glacierNumbers, profileFields } from '../../src/model/diagnostics';
import type { FlowlineModel, SchemeName } from '../../src/model/flowlineModel';
import type { ValleySection } from '../../src/model/physics/valleySection';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import { FlowlineSimulation } from '../../src/model/simulation';
import { handBuiltModel } from './helpers/handBuiltModel';

const FLOOR = 200;
const H0 = 150;
const MELT = -2;
const YEARS = 50;

/** A flat valley with no flow (A = 0): the ice only melts, everywhere alike. */
function meltingValley(section: ValleySection, scheme: SchemeName): FlowlineModel {
  const model = handBuiltModel({ length: 2000, spacing: 100, rateFactorPerYear: 0, balance: () => MELT, initialThickness: () => H0, scheme });
  const N = model.grid.cellCount;
  return {
    ...model,
    grid: { ...model.grid, widthAtCells: new Float64Array(N).fill(FLOOR), widthAtFaces: new Float64Array(N + 1).fill(FLOOR), section },
  };
}

describe.each(['explicit', 'implicit'] as const)('a melting glacier in a valley section (%s scheme)', (scheme) => {
  const H1 = H0 + MELT * YEARS;
  const length = 2000;

  it('trapezoid (widening 300 m: k = 3): thins by 100 m and loses (w0 dH + k/2 (H1^2 - H0^2)) per metre = 50,000 m^2, 2.5 x the floor-width walls, to 1e-12; surface 650 -> 350 m', () => {
    const model = meltingValley({ shape: 'trapezoidal', widening: 300 }, scheme);
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    simulation.advanceTo(YEARS);
    for (const h of simulation.thickness) expect(h).toBeCloseTo(H1, 9);
    const k = 3;
    const lossPerMetre = -(FLOOR * (H1 - H0) + (k / 2) * (H1 * H1 - H0 * H0));
    expect(lossPerMetre).toBe(50_000);
    const volumeChange = simulation.volume() - simulation.initialVolume;
    expect(volumeChange / (-lossPerMetre * length) - 1).toBeCloseTo(0, 12);
    const budget = simulation.massBudget();
    expect(budget.appliedBalance / volumeChange - 1).toBeCloseTo(0, 12);
    expect(cellSurfaceWidth(model.grid, 0, H0)).toBe(650);
    const numbers = glacierNumbers(model, profileFields(model, simulation.thickness, YEARS), YEARS);
    expect(numbers.area).toBeCloseTo((FLOOR + k * H1) * length, 6);
  });

  it('filled parabola (floor 200 m, widening 300 m): loses 2 (w_s0^3 - w_s1^3) / (3p) per metre, to 1e-12', () => {
    const model = meltingValley({ shape: 'parabolic', widening: 300 }, scheme);
    const simulation = new FlowlineSimulation(model, model.initialThickness);
    simulation.advanceTo(YEARS);
    for (const h of simulation.thickness) expect(h).toBeCloseTo(H1, 9);
    const p = ((FLOOR + 300) ** 2 - FLOOR ** 2) / 100;
    const ws0 = Math.sqrt(FLOOR ** 2 + p * H0);
    const ws1 = Math.sqrt(FLOOR ** 2 + p * H1);
    const lossPerMetre = (2 * (ws0 ** 3 - ws1 ** 3)) / (3 * p);
    expect(lossPerMetre).toBeGreaterThan(FLOOR * 100);
    expect((simulation.initialVolume - simulation.volume()) / (lossPerMetre * length) - 1).toBeCloseTo(0, 12);
  });
});

const steppedValley: Scenario = {
  format: 'firnline-scenario',
  version: 1,
  name: 'Section test valley (invented)',
  grid: { length: 8000, spacing: 50 },
  bed: [[0, 3000], [2000, 2700], [3000, 2640], [3500, 2660], [4000, 2600], [4050, 2450], [8000, 2000]],
  width: [[0, 500], [8000, 150]],
  shapeFactor: { crossSection: 'parabolic' },
  ice: { n: 3, A: 2.4e-24 },
  sliding: { C: 2e-14, m: 3 },
  massBalance: { model: 'linear', ela: 2850, ablationGradient: 0.008, accumulationGradient: 0.005, maxAccumulation: 2 },
  warming: [[0, -1], [300, -1], [500, 2.5]],
  run: { years: 600, outputEvery: 50 },
};

describe.each([
  ['parabolic', { shape: 'parabolic', widening: 400 }, 'parabolic'],
  ['trapezoidal', { shape: 'trapezoidal', widening: 300 }, 'rectangular'],
] as const)('a glacier advancing and retreating in a %s section', (_label, section, table) => {
  const scenario: Scenario = { ...steppedValley, section, shapeFactor: { crossSection: table } };
  const reports = {
    explicit: runScenario({ ...scenario, numerics: { scheme: 'explicit' } }),
    implicit: runScenario({ ...scenario, numerics: { scheme: 'implicit' } }),
  };

  it.each(['explicit', 'implicit'] as const)('%s: the budget closes to 1e-9, and sum(w_s b dx) over each output interval is the volume change (no outflow), to 1e-9', (scheme) => {
    const report = reports[scheme];
    const budget = report.summary.massBudget;
    expect(budget.relativeResidual).toBeLessThanOrEqual(1e-9);
    expect(budget.outflow).toBe(0);
    const model = createFlowlineModel(scenario);
    const dx = scenario.grid.spacing;
    for (let k = 1; k < report.frames.length; k++) {
      const frame = report.frames[k];
      const interval = frame.time - report.frames[k - 1].time;
      let booked = 0;
      frame.fields.thickness.forEach((H, i) => {
        booked += (frame.fields.balance[i] / model.iceToWaterEquivalent) * cellSurfaceWidth(model.grid, i, H) * dx * interval;
      });
      const volumeChange = frame.numbers.volume - report.frames[k - 1].numbers.volume;
      expect(Math.abs(booked - volumeChange)).toBeLessThanOrEqual(1e-9 * budget.grossAccumulation);
    }
  });

  it('the two schemes agree on the volume at every output to 1 % of the largest volume (fixed width: 0.6 %), and the glacier advanced and retreated', () => {
    const { explicit, implicit } = reports;
    const largest = Math.max(...explicit.frames.map((f) => f.numbers.volume));
    for (let k = 1; k < explicit.frames.length; k++) {
      expect(Math.abs(implicit.frames[k].numbers.volume - explicit.frames[k].numbers.volume)).toBeLessThan(0.01 * largest);
    }
    const lengths = implicit.frames.map((f) => f.numbers.length);
    expect(Math.max(...lengths)).toBeGreaterThan(lengths[lengths.length - 1] + 300);
  });
});

describe.each(['explicit', 'implicit'] as const)('a narrow floor under wide flanks, heavy accumulation and a calving lake (%s)', (scheme) => {
  it.each([
    ['parabolic', 'parabolic'],
    ['trapezoidal', 'rectangular'],
  ] as const)('%s: the run completes from bare ground and the budget with frontal ablation closes to 1e-9', (shape, table) => {
    const report = runScenario({
      ...steppedValley,
      grid: { length: 8000, spacing: 100 },
      bed: [[0, 3000], [2000, 2700], [3000, 2640], [3500, 2660], [4000, 2600], [4050, 2450], [4500, 2380], [4700, 2420], [8000, 2300]],
      width: [[0, 10], [8000, 5]],
      section: { shape, widening: 1500 },
      shapeFactor: { crossSection: table },
      massBalance: { model: 'linear', ela: 2850, ablationGradient: 0.01, accumulationGradient: 0.01, maxAccumulation: 4 },
      warming: [[0, -1.5], [300, -1.5], [500, 2.5]],
      frontalAblation: { waterDepthCoefficient: 5 },
      numerics: { scheme },
    });
    const budget = report.summary.massBudget;
    expect(budget.relativeResidual).toBeLessThanOrEqual(1e-9);
    expect(budget.frontalAblation).toBeGreaterThan(0);
    expect(Math.max(...report.frames.map((f) => f.numbers.length))).toBeGreaterThan(4500);
  });
});

describe.each(['explicit', 'implicit'] as const)('a rectangular section is the fixed-width model (%s)', (scheme) => {
  it('same volume, length and thickness at every output, to 1e-9 of the volume and 1e-6 m', () => {
    const base: Scenario = { ...steppedValley, run: { years: 300, outputEvery: 50 }, shapeFactor: { crossSection: 'rectangular' }, numerics: { scheme } };
    const fixed = runScenario(base);
    const sectioned = runScenario({ ...base, section: { shape: 'rectangular' } });
    const largest = Math.max(...fixed.frames.map((f) => f.numbers.volume));
    expect(largest).toBeGreaterThan(0);
    for (let k = 0; k < fixed.frames.length; k++) {
      expect(Math.abs(sectioned.frames[k].numbers.volume - fixed.frames[k].numbers.volume)).toBeLessThan(1e-9 * largest);
      expect(sectioned.frames[k].numbers.length).toBe(fixed.frames[k].numbers.length);
      fixed.frames[k].fields.thickness.forEach((h, i) => expect(Math.abs(sectioned.frames[k].fields.thickness[i] - h)).toBeLessThan(1e-6));
    }
  });
});
