/**
 * The shipped demo valley (invented) against rules of thumb. Common practice, not tests against
 * a single source: driving stresses of valley glaciers are mostly 50-150 kPa (Paterson 1994;
 * Cuffey & Paterson 2010, ch. 8 — a range, not a law), surface speeds of such glaciers are tens of
 * metres per year, accumulation-area ratios of glaciers near balance are about 0.5-0.7 (common
 * practice), and Nye crevasses are mostly 20-30 m deep, rarely over 50 m (Holdsworth 1969).
 */
import { describe, expect, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { glacierNumbers, profileFields } from '../../src/model/diagnostics';
import { runScenario } from '../../src/model/runScenario';
import { validScenarioOf } from '../../src/scenario/validateScenario';

describe('demo valley, spun-up steady glacier at year 0', () => {
  const scenario = { ...validScenarioOf(demo, 'examples/demo-valley.json'), run: { years: 1, outputEvery: 1 }, warming: undefined };
  const report = runScenario(scenario);
  const profile = profileFields(report.model, report.frames[0].fields.thickness, 0);
  const numbers = glacierNumbers(report.model, profile, 0);
  const glacierCells = [...profile.thickness.keys()].filter((i) => profile.thickness[i] >= 1);

  it('spin-up converges and the glacier ends inside the valley, 8-11 km long', () => {
    expect(report.summary.spinup?.converged).toBe(true);
    expect(numbers.length).toBeGreaterThan(8000);
    expect(numbers.length).toBeLessThan(11_000);
  });

  it('driving stress is within 50-150 kPa over at least 80 % of the glacier (common practice)', () => {
    const within = glacierCells.filter((i) => profile.drivingStress[i] >= 50 && profile.drivingStress[i] <= 150);
    expect(within.length / glacierCells.length).toBeGreaterThanOrEqual(0.8);
  });

  it('surface speeds are tens of metres per year (common practice): median 10-100 m/a', () => {
    const speeds = glacierCells.map((i) => Math.abs(profile.surfaceSpeed[i])).sort((a, b) => a - b);
    const median = speeds[Math.floor(speeds.length / 2)];
    expect(median).toBeGreaterThan(10);
    expect(median).toBeLessThan(100);
  });

  it('the steady AAR lies in 0.5-0.7 (common practice)', () => {
    expect(numbers.aar).toBeGreaterThan(0.5);
    expect(numbers.aar).toBeLessThan(0.7);
  });

  it('the deepest Nye crevasse is between 0 and 50 m (Holdsworth 1969)', () => {
    expect(Math.max(...profile.crevasseDepth)).toBeLessThan(50);
    expect(Math.max(...profile.crevasseDepth)).toBeGreaterThan(0);
  });
});
