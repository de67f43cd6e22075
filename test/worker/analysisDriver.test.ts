import { describe, expect, it } from 'vitest';
import { calibrateTerminus, spunUpTerminus } from '../../src/model/analysis/calibrateTerminus';
import { committedChange } from '../../src/model/analysis/committedChange';
import { sensitivityCurve, warmingLadder } from '../../src/model/analysis/sensitivityCurve';
import { createFlowlineModel } from '../../src/model/createFlowlineModel';
import { spinUp } from '../../src/model/spinUp';
import type { FromAnalysisWorker } from '../../src/worker/analysisProtocol';
import { createAnalysisDriver, PROGRESS_INTERVAL_MS } from '../../src/worker/analysisDriver';
import { testValley } from '../analysis/valley';
import { checked, unchecked } from '../helpers/checkedScenario';

/** A driver with a hand-cranked scheduler and a hand-set clock; posts go through structuredClone, as postMessage does. */
function harness(msPerRead = 1) {
  const received: FromAnalysisWorker[] = [];
  const postedAt: number[] = [];
  const queue: (() => void)[] = [];
  let clock = 0;
  const driver = createAnalysisDriver(
    (message) => {
      received.push(structuredClone(message));
      postedAt.push(clock);
    },
    (resume) => queue.push(resume),
    // Each reading of the clock moves it on, so slices end after a few steps and progress is due.
    () => (clock += msPerRead),
  );
  const crank = (limit = Infinity) => {
    for (let n = 0; n < limit && queue.length; n++) queue.shift()!();
  };
  return { driver, received, postedAt, queue, crank, types: () => received.map((m) => m.type) };
}

const scenario = checked(testValley());

describe('analysis driver', () => {
  it('runs a sensitivity curve in slices, reporting progress, and ends with the same curve as the direct call', () => {
    const h = harness();
    h.driver.handle({ type: 'start', jobId: 1, request: { kind: 'sensitivity', scenario, from: 0, to: 1, step: 0.5 } });
    expect(h.received).toEqual([]); // nothing is computed before the first slice
    h.crank();
    expect(h.types().at(-1)).toBe('result');
    const progress = h.received.filter((m) => m.type === 'progress');
    expect(progress.length).toBeGreaterThan(1);
    const fractions = progress.map((m) => m.progress.fraction!);
    expect(fractions).toEqual([...fractions].sort((a, b) => a - b));
    const result = h.received.at(-1) as Extract<FromAnalysisWorker, { type: 'result' }>;
    expect(result.jobId).toBe(1);
    const model = createFlowlineModel(scenario);
    expect(result.result).toEqual({
      kind: 'sensitivity',
      points: sensitivityCurve(model, model.initialThickness, warmingLadder(0, 1, 0.5)),
      from: 0,
      to: 1,
      step: 0.5,
      domainLength: 6000,
      spacing: 100,
    });
  });

  it('posts progress no more often than every PROGRESS_INTERVAL_MS of its clock', () => {
    // A clock that moves 1 ms a reading: slices of a few steps each, far more slices than reports.
    const h = harness(1);
    h.driver.handle({ type: 'start', jobId: 1, request: { kind: 'sensitivity', scenario, from: 0, to: 1, step: 0.5 } });
    h.crank();
    const times = h.received.flatMap((m, i) => (m.type === 'progress' ? [h.postedAt[i]] : []));
    expect(times.length).toBeGreaterThan(2);
    for (let k = 1; k < times.length; k++) expect(times[k] - times[k - 1]).toBeGreaterThanOrEqual(PROGRESS_INTERVAL_MS);
  });

  it('computes the committed change from the glacier it is sent, under the warming of that year', () => {
    const warmed = testValley({ warming: [[0, 0], [30, 1]] });
    const model = createFlowlineModel(warmed);
    const thickness = spinUp(model, model.initialThickness).thickness;
    const h = harness();
    h.driver.handle({ type: 'start', jobId: 4, request: { kind: 'committed', scenario: checked(warmed), year: 15, thickness } });
    h.crank();
    const result = h.received.at(-1) as Extract<FromAnalysisWorker, { type: 'result' }>;
    expect(result.result.kind).toBe('committed');
    // Warming at year 15 of a 0 -> 1 K ramp over 30 years: 0.5 K.
    expect(result.result.kind === 'committed' && result.result.committed).toEqual(committedChange(model, thickness, 0.5, 15));
  });

  it('calibrates in slices to the same answer as the direct call', () => {
    const observed = spunUpTerminus(testValley({ massBalance: { model: 'linear', ela: 2870, ablationGradient: 0.007, accumulationGradient: 0.004, maxAccumulation: 2 } })).terminus;
    const h = harness();
    h.driver.handle({ type: 'start', jobId: 2, request: { kind: 'calibration', scenario, observedTerminus: observed, tolerance: 50 } });
    h.crank();
    const result = h.received.at(-1) as Extract<FromAnalysisWorker, { type: 'result' }>;
    expect(result.type).toBe('result');
    expect(result.result.kind === 'calibration' && result.result.calibration).toEqual(calibrateTerminus(scenario, { observedTerminus: observed, tolerance: 50 }));
    expect(h.received.some((m) => m.type === 'progress' && /^spin-up \d+ \(at most 80\): ELA/.test(m.progress.message))).toBe(true);
  });

  it('stops between slices on cancel and posts no result', () => {
    const h = harness();
    h.driver.handle({ type: 'start', jobId: 3, request: { kind: 'sensitivity', scenario, from: -2, to: 4, step: 0.5 } });
    h.crank(3);
    h.driver.handle({ type: 'cancel', jobId: 3 });
    h.crank();
    expect(h.types().at(-1)).toBe('cancelled');
    expect(h.types()).not.toContain('result');
    expect(h.queue).toHaveLength(0);
  });

  it('ignores a cancel for another job, and a new start replaces the job under way', () => {
    const h = harness();
    h.driver.handle({ type: 'start', jobId: 5, request: { kind: 'sensitivity', scenario, from: -2, to: 4, step: 0.5 } });
    h.crank(2);
    h.driver.handle({ type: 'cancel', jobId: 4 });
    h.driver.handle({ type: 'start', jobId: 6, request: { kind: 'sensitivity', scenario, from: 0, to: 0.5, step: 0.5 } });
    h.crank();
    const ends = h.received.filter((m) => m.type !== 'progress');
    expect(ends.map((m) => `${m.type}:${m.jobId}`)).toEqual(['cancelled:5', 'result:6']);
  });

  it('reports a scenario the model cannot build, and a glacier that does not fit the grid, as failures', () => {
    const h = harness();
    const broken = unchecked({ ...scenario, grid: { length: 6000, spacing: 0 } });
    h.driver.handle({ type: 'start', jobId: 7, request: { kind: 'sensitivity', scenario: broken, from: 0, to: 1, step: 0.5 } });
    h.crank();
    h.driver.handle({ type: 'start', jobId: 8, request: { kind: 'committed', scenario, year: 0, thickness: new Float64Array(3) } });
    h.crank();
    const failures = h.received.filter((m) => m.type === 'failed');
    expect(failures.map((m) => m.jobId)).toEqual([7, 8]);
    expect(failures[1].type === 'failed' && failures[1].message).toBe("the glacier given has 3 cells but the scenario's grid has 60");
  });
});
