import { describe, expect, it } from 'vitest';
import { detectStepForcing, eFoldingTime } from '../../src/model/responseTime';
import { runScenario } from '../../src/model/runScenario';
import type { Scenario } from '../../src/model/scenario';
import type { AnnualRecord } from '../../src/model/simulation';

describe('eFoldingTime(record, start)', () => {
  it('recovers tau = 37 a within 0.5 a from an exact exponential approach V = V0 + dV (1 - exp(-t / tau))', () => {
    const tau = 37;
    const record: AnnualRecord = { years: [], volume: [], terminus: [], accumulation: [] };
    for (let year = 0; year <= 1500; year++) {
      record.years.push(year);
      record.volume.push(5e8 - 2e8 * (year < 20 ? 0 : 1 - Math.exp(-(year - 20) / tau)));
    }
    expect(eFoldingTime(record, 20)).toBeCloseTo(tau, 0);
  });
});

describe('detectStepForcing(points, years)', () => {
  it('a change within one year is a step', () => {
    expect(detectStepForcing([[0, 0], [1, 2]], 500)).toEqual({ start: 0, end: 1, change: 2 });
  });
  it('a step later in the run starts where the warming starts to change', () => {
    expect(detectStepForcing([[0, 0], [100, 0], [101, -1]], 500)).toEqual({ start: 100, end: 101, change: -1 });
  });
  it('a century-long ramp is not a step', () => {
    expect(detectStepForcing([[0, 0], [100, 2]], 300)).toBeUndefined();
  });
  it('a 50-year ramp in a 1,000-year run is not a step either: a step is a jump, not a short ramp', () => {
    expect(detectStepForcing([[0, 0], [50, 1]], 1000)).toBeUndefined();
    expect(detectStepForcing([[0, 0], [200, 0], [202, 1]], 1000)).toBeUndefined();
  });
  it('no change is not a step', () => {
    expect(detectStepForcing([[0, 1], [50, 1]], 300)).toBeUndefined();
  });
});

describe('volume response time after a step warming (Johannesson, Raymond & Waddington 1989)', () => {
  // Invented, evenly sloping valley; +1 K step at year 0 after a spin-up.
  const scenario: Scenario = {
    format: 'firnline-scenario',
    version: 1,
    grid: { length: 10_000, spacing: 100 },
    bed: [[0, 3300], [10_000, 2300]],
    width: [[0, 1200], [10_000, 800]],
    ice: { n: 3, A: 2.4e-24 },
    sliding: { C: 2e-14, m: 3 },
    massBalance: { model: 'linear', ela: 2950, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 },
    warming: [[0, 0], [1, 1]],
    spinup: true,
    run: { years: 800, outputEvery: 50 },
  };
  const report = runScenario(scenario);
  const response = report.summary.responseTime;

  it('the model e-folding time agrees with H / (-b_t) within a factor of two (ratio 0.5-2), and the run ends steady', () => {
    expect(response).toBeDefined();
    console.info(`response time: model ${response!.eFoldingYears.toFixed(1)} a, estimate ${response!.estimateYears.toFixed(1)} a`);
    expect(response!.reachedSteadyState).toBe(true);
    const ratio = response!.eFoldingYears / response!.estimateYears;
    expect(ratio).toBeGreaterThan(0.5);
    expect(ratio).toBeLessThan(2);
  });

  it('is tens of years: between 10 and 150 a (mountain glaciers respond in decades; common practice)', () => {
    expect(response!.eFoldingYears).toBeGreaterThan(10);
    expect(response!.eFoldingYears).toBeLessThan(150);
  });
});
