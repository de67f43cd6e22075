import { beforeEach, describe, expect, it } from 'vitest';
import { FRAME_MEMORY_BUDGET_BYTES, isActive, maxFramesFor, thinFrames, useRunStore } from '../../src/state/runStore';
import type { FromWorker } from '../../src/worker/protocol';
import { runMessages, shortDemo } from './runFixtures';
import { resetStores } from '../helpers/resetStores';

const messages = runMessages(shortDemo, 1);
const store = () => useRunStore.getState();

beforeEach(() => {
  resetStores();
  store().begin(1, 7, shortDemo.run.years);
});

describe('run store', () => {
  it('goes from starting to running to done, keeping every frame and the summary', () => {
    expect(store().status).toBe('starting');
    expect(store().incoming?.revision).toBe(7);
    store().receive(messages.slice(0, 3));
    expect(store().revision).toBe(7);
    expect(store().status).toBe('running');
    expect(store().frames.map((f) => f.time)).toEqual([0, 5]);
    expect(store().progress).toEqual({ phase: 'run', year: 5, of: 20 });
    store().receive(messages.slice(3));
    expect(store().status).toBe('done');
    expect(store().frames).toHaveLength(5);
    expect(store().summary?.massBudget).toBeDefined();
    // Axis ranges cover every frame.
    const maxSpeed = Math.max(...store().frames.map((f) => f.numbers.maxSurfaceSpeed));
    expect(store().ranges?.maxSpeed).toBeCloseTo(maxSpeed, 9);
  });

  it('keeps the previous results on screen until the next run sends its first frame', () => {
    store().receive(messages);
    const previous = store().frames;
    store().begin(2, 8, shortDemo.run.years);
    const again = runMessages(shortDemo, 2);
    store().receive(again.slice(0, 1));
    expect(store().status).toBe('running');
    expect(store().frames).toBe(previous);
    expect(store().revision).toBe(7);
    store().receive(again.slice(1, 2));
    expect(store().frames).toHaveLength(1);
    expect(store().frames[0]).not.toBe(previous[0]);
    expect(store().revision).toBe(8);
    expect(store().incoming).toBeNull();
  });

  it('clears the previous results when the next run ends before its first frame', () => {
    store().receive(messages);
    store().begin(2, 8, shortDemo.run.years);
    store().receive([{ type: 'failed', runId: 2, message: 'the scenario could not be prepared' }]);
    expect(store().frames).toHaveLength(0);
    expect(store().revision).toBe(8);
  });

  it('reports spin-up progress, pause and resume', () => {
    const started: FromWorker = { ...(messages[0] as Extract<FromWorker, { type: 'started' }>), spinUp: true };
    store().receive([started, { type: 'spinup-progress', runId: 1, year: 120, of: 20000 }]);
    expect(store().status).toBe('spinning-up');
    expect(store().progress).toEqual({ phase: 'spinup', year: 120, of: 20000 });
    store().receive([{ type: 'paused', runId: 1 }]);
    expect(store().status).toBe('paused');
    expect(isActive(store().status)).toBe(true);
    store().receive([{ type: 'resumed', runId: 1 }]);
    expect(store().status).toBe('spinning-up');
  });

  it('keeps the spin-up glacier as a preview until the first output frame replaces it', () => {
    const started: FromWorker = { ...(messages[0] as Extract<FromWorker, { type: 'started' }>), spinUp: true };
    const thickness = new Float64Array(240).fill(50);
    store().receive([started, { type: 'spinup-progress', runId: 1, year: 60, of: 20000, thickness }]);
    expect(store().spinUpPreview).toEqual({ year: 60, thickness });
    store().receive([messages.find((m) => m.type === 'frame')!]);
    expect(store().spinUpPreview).toBeNull();
  });

  it('keeps the frames before a failure and says where it happened', () => {
    store().receive([...messages.slice(0, 3), { type: 'failed', runId: 1, message: 'thickness not finite', year: 7.5, position: 4200 }]);
    expect(store().status).toBe('failed');
    expect(store().frames).toHaveLength(2);
    expect(store().failure).toEqual({ message: 'thickness not finite', year: 7.5, position: 4200 });
    expect(isActive(store().status)).toBe(false);
  });

  it('ignores messages from a replaced run', () => {
    store().receive(messages.map((m) => ({ ...m, runId: 99 })));
    expect(store().status).toBe('starting');
    expect(store().frames).toHaveLength(0);
  });

  it('after a reset (another project opened) ignores what the dropped run still sends', () => {
    store().receive(messages.slice(0, 3));
    store().reset();
    store().receive([{ type: 'stopped', runId: 1 }, ...messages.slice(3)]);
    expect(store().status).toBe('idle');
    expect(store().frames).toHaveLength(0);
  });

  it('marks a lost worker as a failure of the run going on, keeping its frames', () => {
    store().receive(messages.slice(0, 3));
    store().workerLost('The model stopped unexpectedly.');
    expect(store().status).toBe('failed');
    expect(store().notice).toBe('The model stopped unexpectedly.');
    expect(store().frames).toHaveLength(2);
  });
});

describe('frame memory budget', () => {
  it('thinFrames keeps every other frame, the first and the last', () => {
    expect(thinFrames([0, 1, 2, 3, 4])).toEqual([0, 2, 4]);
    expect(thinFrames([0, 1, 2, 3, 4, 5])).toEqual([0, 2, 4, 5]);
  });

  it('maxFramesFor keeps a 100,000-cell run within the budget but never fewer than 64 frames', () => {
    expect(maxFramesFor(240) * 240 * 8 * 8).toBeLessThanOrEqual(FRAME_MEMORY_BUDGET_BYTES);
    expect(maxFramesFor(100_000)).toBe(64);
  });

  it('a run with more frames than the budget allows is thinned, and says by how much', () => {
    // One shared array stands for every field: the store only sizes frames by their length.
    const shared = new Float64Array(100_000);
    const field = () => shared;
    const started: FromWorker = { ...(messages[0] as Extract<FromWorker, { type: 'started' }>) };
    store().receive([started]);
    const frames: FromWorker[] = Array.from({ length: 130 }, (_, k) => {
      const template = messages.find((m) => m.type === 'frame') as Extract<FromWorker, { type: 'frame' }>;
      const fields = Object.fromEntries(Object.keys(template.frame.fields).map((key) => [key, field()])) as typeof template.frame.fields;
      return { ...template, frame: { ...template.frame, time: k, fields } };
    });
    store().receive(frames);
    expect(store().frames.length).toBeLessThanOrEqual(64);
    expect(store().thinning).toBe(4);
    expect(store().frames[0].time).toBe(0);
    expect(store().frames.at(-1)!.time).toBe(129);
  });
});
