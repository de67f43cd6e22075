import { beforeEach, describe, expect, it } from 'vitest';
import { CHECKING_EDIT_REFUSED, EXPERIMENT_UPDATE_INTERVAL_MS, resultBytes, RUNNING_EDIT_REFUSED, useExperimentStore, type PoolOptions } from '../../src/state/experimentStore';
import { demoScenario } from '../../src/state/scenarioStore';
import { parameterSweep, warmingLadder } from '../../src/ui/experiments/experimentSets';
import { MEMBERS_CHECKED_HERE } from '../../src/worker/experimentCheckClient';
import { runMember } from '../../src/worker/experimentMemberRun';
import { InProcessMemberWorker, SilentMemberWorker } from '../worker/memberWorkerFakes';

const store = () => useExperimentStore.getState();
const short = { ...demoScenario, spinup: false, run: { years: 20, outputEvery: 5 } };

function inProcessPool(crashOn = new Set<number>()): PoolOptions & { created: number } {
  const pool = { created: 0, size: (n: number) => Math.min(2, n), createWorker: () => (pool.created++, new InProcessMemberWorker(crashOn)) };
  return pool;
}

function ladder() {
  const made = warmingLadder(store().experiment!, { fromK: 1, toK: 3, stepK: 1, year: 10 });
  if (!made.ok) throw new Error(JSON.stringify(made.errors));
  return made.experiment;
}

beforeEach(async () => {
  await store().load(null);
  store().startFrom(short);
});

describe('experiment store', () => {
  it('starts from a scenario: one member, the base, ready to run', () => {
    expect(store().experiment).toMatchObject({ format: 'firnline-experiment', version: 1, name: `Experiment on ${demoScenario.name}`, base: short });
    expect(store().members.map((m) => m.name)).toEqual(['1_base']);
    expect(store().runStatus).toBe('idle');
  });

  it('applies a valid edit whole and refuses an invalid one without changing anything', async () => {
    await expect(store().edit(ladder())).resolves.toEqual({ ok: true });
    expect(store().members).toHaveLength(3);
    const before = store().experiment;
    const duplicate = { ...before!, variants: [...before!.variants!, { name: '+1 K by year 10', set: { ice: { A: 1e-24 } } }] };
    const refused = await store().edit(duplicate);
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.errors[0]).toMatchObject({ path: '/variants/3/name', message: expect.stringMatching(/must be unique/) });
    expect(store().experiment).toBe(before);
    expect(store().members).toHaveLength(3);
  });

  it('runs every member on the pool; results match the member run on this thread; an edit drops them', async () => {
    await store().edit(ladder());
    const pool = inProcessPool();
    await expect(store().run(pool)).resolves.toBe('done');
    expect(pool.created).toBe(2);
    expect(store().workers).toBe(2);
    expect(store().runs.map((r) => r.status)).toEqual(['done', 'done', 'done']);
    store().members.forEach((m, k) => {
      const alone = runMember({ index: m.index, name: m.name, scenario: m.scenario });
      expect(store().runs[k].outcomeRow).toBe(alone.outcomeRow);
      expect(alone.status === 'ok' && Array.from(alone.series.length)).toEqual(Array.from(store().runs[k].result!.series.length));
    });
    // Warmer members lose more ice.
    const ends = store().runs.map((r) => r.result!.outcome.volumeEnd);
    expect(ends[0]).toBeGreaterThan(ends[1]);
    expect(ends[1]).toBeGreaterThan(ends[2]);
    await store().edit({ ...store().experiment!, name: 'Renamed' });
    expect(store().runs).toEqual([]);
    expect(store().runStatus).toBe('idle');
  });

  it('refuses edits while running, and cancel marks unfinished members cancelled', async () => {
    await store().edit(ladder());
    const workers: SilentMemberWorker[] = [];
    const running = store().run({ size: () => 1, createWorker: () => (workers.push(new SilentMemberWorker()), workers.at(-1)!) });
    expect(store().runStatus).toBe('running');
    await expect(store().edit({ ...store().experiment!, name: 'x' })).resolves.toEqual({ ok: false, errors: [RUNNING_EDIT_REFUSED] });
    const finished = runMember({ index: 0, name: store().members[0].name, scenario: store().members[0].scenario });
    workers[0].emit({ type: 'result', index: 0, result: finished });
    store().cancel();
    await expect(running).resolves.toBe('cancelled');
    expect(store().runs.map((r) => r.status)).toEqual(['done', 'cancelled', 'cancelled']);
    expect(workers.every((w) => w.terminated)).toBe(true);
  });

  it('a failed member keeps its message; the others finish', async () => {
    await store().edit(ladder());
    await store().run(inProcessPool(new Set([2])));
    expect(store().runs.map((r) => r.status)).toEqual(['done', 'done', 'failed']);
    expect(store().runs[2].message).toMatch(/stopped unexpectedly/);
    expect(store().runs[2].outcomeRow).toMatch(/^3_\+3-K-by-year-10,failed,/);
  });

  it('checks a large experiment as one change: further changes are refused until it is checked', async () => {
    const made = parameterSweep(store().experiment!, { parameter: 'A', from: 1e-24, to: 4e-24, count: MEMBERS_CHECKED_HERE + 1, spacing: 'linear' });
    if (!made.ok) throw new Error('sweep refused');
    const pending = store().edit(made.experiment);
    expect(store().checking).toBe(MEMBERS_CHECKED_HERE + 1);
    await expect(store().edit({ ...store().experiment!, name: 'meanwhile' })).resolves.toEqual({ ok: false, errors: [CHECKING_EDIT_REFUSED] });
    await expect(pending).resolves.toEqual({ ok: true });
    expect(store().checking).toBe(0);
    expect(store().members).toHaveLength(MEMBERS_CHECKED_HERE + 1);
    // The store holds what the validator returned for this edit (its base a checked scenario).
    expect(store().experiment).toEqual(made.experiment);
  });

  it('opens experiment text whole, or refuses it with the validator\'s messages', async () => {
    const before = store().experiment;
    const refused = await store().openText('{"format": "firnline-experiment", "version": 1, "base": {}');
    expect(refused.ok).toBe(false);
    if (!refused.ok) expect(refused.errors[0].message).toMatch(/not valid JSON \(RFC 8259\) at line 1, column \d+/);
    expect(store().experiment).toBe(before);
    await expect(store().openText(JSON.stringify({ ...before, name: 'From text' }))).resolves.toEqual({ ok: true });
    expect(store().experiment?.name).toBe('From text');
  });

  it('refuses to run when the results would not fit in the browser, saying why and what to do', async () => {
    // 4,000 members of a 100,000-year run with yearly outputs: 4000 x 100,241 x 40 bytes = 15,296 MiB.
    const long = { ...short, run: { years: 100_000, outputEvery: 1 } };
    store().startFrom(long);
    const made = parameterSweep(store().experiment!, { parameter: 'A', from: 1e-24, to: 4e-24, count: 4000, spacing: 'linear' });
    if (!made.ok) throw new Error('sweep refused');
    await expect(store().edit(made.experiment)).resolves.toEqual({ ok: true });
    expect(resultBytes(store().members)).toBe(4000 * (100_001 + 240) * 5 * 8);
    let created = 0;
    await expect(store().run({ size: () => 1, createWorker: () => (created++, new SilentMemberWorker()) })).resolves.toBe('idle');
    expect(created).toBe(0);
    expect(store().runProblem).toMatch(/^Not run: the results of these 4,000 members would take about 15,296 MB in the browser; at most 512 MB is allowed\..*firnline experiment/);
  });

  it('gathers progress into few updates', async () => {
    await store().edit(ladder());
    let updates = 0;
    const off = useExperimentStore.subscribe((s, prev) => void (s.runs !== prev.runs && updates++));
    const started = performance.now();
    await store().run(inProcessPool());
    off();
    const elapsed = performance.now() - started;
    // One update to start, then at most one per interval, then the final one.
    expect(updates).toBeLessThanOrEqual(2 + Math.ceil(elapsed / EXPERIMENT_UPDATE_INTERVAL_MS) + 1);
  });
});
