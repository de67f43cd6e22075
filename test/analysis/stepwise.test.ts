import { describe, expect, it } from 'vitest';
import { calibrateTerminusSteps, spunUpTerminus } from '../../src/model/analysis/calibrateTerminus';
import { committedChangeSteps } from '../../src/model/analysis/committedChange';
import { sensitivityCurveSteps, warmingLadder } from '../../src/model/analysis/sensitivityCurve';
import { steadyUnderWarming } from '../../src/model/analysis/steadyUnderWarming';
import type { AnalysisProgress } from '../../src/model/analysis/stepwise';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { glacierExtent, iceVolume } from '../../src/model/glacierExtent';
import { SpinUp } from '../../src/model/spinUp';
import { testValley } from './valley';

/** Every progress report of a stepwise analysis, and its result. */
function drain<R>(steps: Generator<AnalysisProgress, R, void>): { progress: AnalysisProgress[]; result: R } {
  const progress: AnalysisProgress[] = [];
  for (;;) {
    const next = steps.next();
    if (next.done) return { progress, result: next.value };
    progress.push(next.value);
  }
}

describe('analyses in steps', () => {
  const model = createFlowlineModel(testValley());

  it('a steady state found in 10-year slices is the one found in a single call', () => {
    // The reference advances the spin-up in one call, as the analysis did before it was sliced.
    const held = { ...model, warmingAt: () => 0.5 };
    const reference = new SpinUp(held, model.initialThickness);
    reference.advance(reference.maxYears);
    const sliced = steadyUnderWarming(model, model.initialThickness, 0.5);
    expect(sliced.years).toBe(reference.years);
    expect(Array.from(sliced.thickness)).toEqual(Array.from(reference.thickness));
  });

  it('committed change reports progress and a held-run path from now to the steady state', () => {
    const now = new SpinUp(model, model.initialThickness);
    now.advance(200); // part-way to steady under year-0 climate, then hold +1 K
    const start = Float64Array.from(now.thickness);
    const { progress, result } = drain(committedChangeSteps(model, start, 1, 40));
    expect(progress.length).toBeGreaterThan(0);
    expect(progress.every((p) => p.fraction === undefined && /held run at \d+/.test(p.message))).toBe(true);
    const first = result.path[0];
    const last = result.path[result.path.length - 1];
    expect(first).toEqual({ year: 40, length: glacierExtent(model.grid, start).length, volume: iceVolume(model.grid, start) });
    expect(last).toEqual({ year: 40 + result.yearsToSteady, length: result.lengthSteady, volume: result.volumeSteady });
    const years = result.path.map((p) => p.year);
    expect(years).toEqual([...years].sort((a, b) => a - b));
    expect(new Set(years).size).toBe(years.length);
  });

  it('the sensitivity curve reports its share done, rising to 1 at the last steady state', () => {
    const warmings = warmingLadder(0, 1, 0.5);
    const { progress, result } = drain(sensitivityCurveSteps(model, model.initialThickness, warmings));
    expect(result).toHaveLength(5);
    const fractions = progress.map((p) => p.fraction!);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    expect(fractions.at(-1)).toBe(1);
    expect(progress.some((p) => p.message.startsWith('warming up: steady state 1 of 5 (0 K)'))).toBe(true);
    expect(progress.some((p) => p.message.startsWith('cooling back: steady state 5 of 5 (0 K)'))).toBe(true);
    expect(progress.some((p) => p.message.includes('(+0.5 K)'))).toBe(true);
  });

  it('the calibration reports each spin-up it runs, numbered up to its result', () => {
    const truth = testValley({ massBalance: { model: 'linear', ela: 2870, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 } });
    const observed = spunUpTerminus(truth).terminus;
    const { progress, result } = drain(calibrateTerminusSteps(truth, { observedTerminus: observed, tolerance: 50 }));
    const numbered = new Set(progress.map((p) => /^spin-up (\d+) \(at most 80\): ELA/.exec(p.message)?.[1]));
    expect(numbered.has(undefined)).toBe(false);
    // Every spin-up but the shortest reports at least once; none is numbered beyond the count run.
    expect(Math.max(...[...numbered].map(Number))).toBeLessThanOrEqual(result.iterations);
    expect(result.matched).toBe(true);
  });
});
