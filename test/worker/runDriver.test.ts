import { afterEach, describe, expect, it, vi } from 'vitest';
import { NumericalFailure } from '../../src/model/numericalFailure';
import { ScenarioRun } from '../../src/model/runScenario';
import { readFileSync } from 'node:fs';
import { checked, checkedJson, unchecked } from '../helpers/checkedScenario';
import { demoScenario } from '../../src/state/scenarioStore';
import type { FromWorker } from '../../src/worker/protocol';
import { createRunDriver } from '../../src/worker/runDriver';

/** The demo without spin-up, 20 years with output every 5: frames at 0, 5, 10, 15, 20. */
const short = checked({ ...demoScenario, spinup: false, run: { years: 20, outputEvery: 5 } });

/**
 * A driver whose posts go through structuredClone with the transfer list, as postMessage does:
 * transferred buffers are detached afterwards, so reusing one would be caught.
 */
function harness() {
  const received: FromWorker[] = [];
  const transferred: ArrayBuffer[][] = [];
  const queue: (() => void)[] = [];
  const driver = createRunDriver(
    (message, transfer) => {
      received.push(structuredClone(message, { transfer }));
      transferred.push(transfer);
    },
    (resume) => queue.push(resume),
  );
  /** Runs scheduled slices until none is pending (or `limit` slices). */
  const crank = (limit = Infinity) => {
    for (let n = 0; n < limit && queue.length; n++) queue.shift()!();
  };
  const types = () => received.map((m) => m.type);
  return { driver, received, transferred, queue, crank, types };
}

afterEach(() => vi.restoreAllMocks());

describe('run driver', () => {
  it('sends the grid, then every output frame with transferred fields and numbers, then the summary', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 1, scenario: short });
    h.crank();
    expect(h.types()).toEqual(['started', 'frame', 'frame', 'frame', 'frame', 'frame', 'done']);
    const started = h.received[0] as Extract<FromWorker, { type: 'started' }>;
    expect(started.grid.x.length).toBe(240);
    expect(started.grid.length).toBe(12000);
    const frames = h.received.filter((m) => m.type === 'frame');
    expect(frames.map((f) => f.frame.time)).toEqual([0, 5, 10, 15, 20]);
    for (const [i, f] of frames.entries()) {
      expect(f.runId).toBe(1);
      expect(f.frame.fields.thickness.length).toBe(240);
      expect(f.frame.numbers.length).toBeGreaterThan(5000);
      expect(f.frame.numbers.volume).toBeGreaterThan(0);
      // Frames are copied, not transferred: the run keeps its own whole for its report.
      expect(h.transferred[i + 1]).toEqual([]);
    }
    const done = h.received.at(-1) as Extract<FromWorker, { type: 'done' }>;
    expect(done.summary.massBudget.relativeResidual).toBeLessThan(1e-6);
  });

  it('reports spin-up progress in model years before the first frame', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 2, scenario: checked({ ...demoScenario, run: { years: 5, outputEvery: 5 } }) });
    h.crank();
    const progress = h.received.filter((m) => m.type === 'spinup-progress');
    expect(progress.length).toBeGreaterThan(1);
    const years = progress.map((m) => m.year);
    expect(years).toEqual([...years].sort((a, b) => a - b));
    expect(progress[0].of).toBe(20000);
    expect(h.types().indexOf('frame')).toBeGreaterThan(h.types().lastIndexOf('spinup-progress'));
    expect(h.types().at(-1)).toBe('done');
  });

  it('pauses between slices, steps one frame at a time while paused, and resumes to the end', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 3, scenario: short });
    h.driver.handle({ type: 'pause', runId: 3 });
    h.crank();
    expect(h.types()).toEqual(['started', 'paused']);
    h.driver.handle({ type: 'step', runId: 3 });
    h.crank();
    expect(h.types().filter((t) => t === 'frame')).toHaveLength(1);
    h.driver.handle({ type: 'step', runId: 3 });
    h.crank();
    expect(h.received.filter((m) => m.type === 'frame').map((m) => m.frame.time)).toEqual([0, 5]);
    h.driver.handle({ type: 'resume', runId: 3 });
    h.crank();
    expect(h.received.filter((m) => m.type === 'frame').map((m) => m.frame.time)).toEqual([0, 5, 10, 15, 20]);
    expect(h.types().slice(-2)).toEqual(['frame', 'done']);
  });

  it('starts held when asked, so that stepping begins at the first output', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 9, scenario: short, paused: true });
    h.driver.handle({ type: 'step', runId: 9 });
    h.crank();
    expect(h.types()).toEqual(['started', 'paused', 'frame']);
    expect(h.received[2]).toMatchObject({ type: 'frame', frame: { time: 0 } });
  });

  it('stops when told and ignores messages for other runs', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 4, scenario: short });
    h.driver.handle({ type: 'pause', runId: 99 });
    h.driver.handle({ type: 'stop', runId: 4 });
    h.crank();
    expect(h.types()).toEqual(['started', 'stopped']);
    h.driver.handle({ type: 'resume', runId: 4 });
    h.crank();
    expect(h.types()).toEqual(['started', 'stopped']);
  });

  it('a new start replaces the run going on', () => {
    const h = harness();
    h.driver.handle({ type: 'start', runId: 5, scenario: short });
    h.driver.handle({ type: 'start', runId: 6, scenario: short });
    h.crank();
    expect(h.received.filter((m) => m.type === 'frame').every((m) => m.runId === 6)).toBe(true);
    expect(h.received.at(-1)).toMatchObject({ type: 'done', runId: 6 });
  });

  it('reports a numerical failure with its year and position after the frames already sent', () => {
    const h = harness();
    const original = ScenarioRun.prototype.nextFrame;
    let calls = 0;
    vi.spyOn(ScenarioRun.prototype, 'nextFrame').mockImplementation(function (this: ScenarioRun) {
      if (++calls === 3) throw new NumericalFailure('ice thickness is not a number', 7.5, 4200);
      return original.call(this);
    });
    h.driver.handle({ type: 'start', runId: 7, scenario: short });
    h.crank();
    expect(h.types()).toEqual(['started', 'frame', 'frame', 'failed']);
    expect(h.received.at(-1)).toEqual({
      type: 'failed',
      runId: 7,
      message: 'ice thickness is not a number',
      year: 7.5,
      position: 4200,
    });
    // Nothing more is scheduled after a failure.
    expect(h.queue).toHaveLength(0);
  });

  it('reports a scenario the model cannot be built from as a failure, not a crash', () => {
    const h = harness();
    const broken = unchecked({ ...short, grid: { length: 12000, spacing: 0 } });
    expect(() => h.driver.handle({ type: 'start', runId: 8, scenario: broken })).not.toThrow();
    h.crank();
    expect(h.types().at(-1)).toBe('failed');
  });

  it('reuses the spin-up when only the warming or the run changes ("Run again"), and frames match a fresh run', () => {
    const spun = checked({ ...demoScenario, run: { years: 10, outputEvery: 5 } });
    const h = harness();
    h.driver.handle({ type: 'start', runId: 1, scenario: spun });
    h.crank();
    expect(h.types()).toContain('spinup-progress');
    const warmer = checked({ ...spun, warming: [[0, 0], [5, 2]] });
    const before = h.received.length;
    h.driver.handle({ type: 'start', runId: 2, scenario: warmer });
    h.crank();
    const second = h.received.slice(before);
    expect(second.map((m) => m.type)).not.toContain('spinup-progress');
    const done = second.find((m) => m.type === 'done') as Extract<FromWorker, { type: 'done' }>;
    expect(done.summary.spinup).toMatchObject({ reused: true });
    // Independent check: the same scenario run from scratch.
    const fresh = new ScenarioRun(warmer);
    while (fresh.nextFrame());
    const frames = second.filter((m) => m.type === 'frame') as Extract<FromWorker, { type: 'frame' }>[];
    expect(frames.map((f) => Array.from(f.frame.fields.thickness))).toEqual(fresh.frames.map((f) => Array.from(f.fields.thickness)));
  });
});

describe('run driver: keeping the spin-up', () => {
  it('keeps it for "Run again" even when a slice\'s first chunk is the one that finishes it', () => {
    // A clock that moves 10 ms per reading: every slice does exactly one chunk of work, so the
    // spin-up always ends on the first chunk of a slice.
    let t = 0;
    const received: FromWorker[] = [];
    const queue: (() => void)[] = [];
    const driver = createRunDriver(
      (message, transfer) => received.push(structuredClone(message, { transfer })),
      (resume) => queue.push(resume),
      () => (t += 10),
    );
    const spun = checked({ ...demoScenario, spinup: true, run: { years: 10, outputEvery: 5 } });
    driver.handle({ type: 'start', runId: 1, scenario: spun });
    while (queue.length) queue.shift()!();
    expect(received.at(-1)?.type).toBe('done');
    const before = received.length;
    driver.handle({ type: 'start', runId: 2, scenario: checked({ ...spun, warming: [[0, 0], [5, 2]] }) });
    while (queue.length) queue.shift()!();
    const done = received.slice(before).find((m) => m.type === 'done') as Extract<FromWorker, { type: 'done' }>;
    expect(done.summary.spinup).toMatchObject({ reused: true });
  });
});

describe('run driver: the first state before the engine', () => {
  it('posts the spin-up starting state, then waits on its own schedule before the first slice', () => {
    const received: FromWorker[] = [];
    const slices: (() => void)[] = [];
    const holds: (() => void)[] = [];
    const driver = createRunDriver(
      (message, transfer) => received.push(structuredClone(message, { transfer })),
      (resume) => slices.push(resume),
      () => performance.now(),
      (resume) => holds.push(resume),
    );
    driver.handle({ type: 'start', runId: 1, scenario: checked({ ...demoScenario, spinup: true, run: { years: 10, outputEvery: 5 } }) });
    // The page has its starting glacier; no engine work is queued until the hold ends.
    expect(received.map((m) => m.type)).toEqual(['started', 'spinup-progress']);
    expect(slices).toHaveLength(0);
    expect(holds).toHaveLength(1);
    holds.shift()!();
    while (slices.length) slices.shift()!();
    expect(received.at(-1)?.type).toBe('done');
    expect(holds).toHaveLength(0);
  });

  it('runs the example examples/snorvelt-lake.json as the browser does: frames report the calving, the budget closes', () => {
    const example = checkedJson(JSON.parse(readFileSync(new URL('../../examples/snorvelt-lake.json', import.meta.url), 'utf8')));
    const h = harness();
    h.driver.handle({ type: 'start', runId: 7, scenario: example });
    h.crank();
    expect(h.received.at(-1)?.type).toBe('done');
    const frames = h.received.filter((m) => m.type === 'frame');
    expect(frames.length).toBe(41);
    expect(frames.some((f) => f.frame.numbers.frontalAblation > 0)).toBe(true);
    const done = h.received.at(-1) as Extract<FromWorker, { type: 'done' }>;
    expect(done.summary.massBudget.frontalAblation).toBeGreaterThan(0);
    expect(done.summary.massBudget.relativeResidual).toBeLessThan(1e-9);
  });
});
