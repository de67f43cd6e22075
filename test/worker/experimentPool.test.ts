import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runMemberJob } from '../../src/cli/experimentMember';
import { experimentRows } from '../../src/outputs/experimentCsv';
import { validateExperiment } from '../../src/experiment/validateExperiment';
import { demoScenario } from '../../src/state/scenarioStore';
import type { MemberJob } from '../../src/worker/experimentProtocol';
import { runMember, type MemberRunResult } from '../../src/worker/experimentMemberRun';
import { poolSize, runExperimentPool, type MemberWorkerLike } from '../../src/worker/experimentPool';
import { InProcessMemberWorker, SilentMemberWorker } from './memberWorkerFakes';
import { bundleThreadWorker, ThreadMemberWorker } from './threadMemberWorker';

/** Four members of the demo valley, spin-up included, 40 years with output every 10. */
function ladderJobs(): MemberJob[] {
  const base = { ...demoScenario, spinup: true, run: { years: 40, outputEvery: 10 } };
  const checked = validateExperiment({
    format: 'firnline-experiment',
    version: 1,
    base,
    variants: [
      { name: 'none', set: {} },
      { name: '+1 K', set: { warming: [[0, 0], [20, 1]] } },
      { name: '+3 K', set: { warming: [[0, 0], [20, 3]] } },
      { name: 'soft ice', set: { ice: { A: 4.8e-24 }, warming: [[0, 0], [20, 2]] } },
    ],
  });
  if (!checked.ok) throw new Error(JSON.stringify(checked.errors));
  return checked.members.map((m) => ({ index: m.index, name: m.name, scenario: m.scenario }));
}

/** Every number in both values, compared with Object.is (so -0 and NaN count); returns how many. */
function compareBits(a: unknown, b: unknown, path: string, mismatches: string[]): number {
  if (typeof a === 'number' || typeof b === 'number') {
    if (!Object.is(a, b)) mismatches.push(`${path}: ${String(a)} vs ${String(b)}`);
    return 1;
  }
  if (ArrayBuffer.isView(a) || Array.isArray(a)) {
    const x = a as ArrayLike<unknown>;
    const y = b as ArrayLike<unknown>;
    if (!y || x.length !== y.length) {
      mismatches.push(`${path}: lengths differ`);
      return 0;
    }
    let n = 0;
    for (let k = 0; k < x.length; k++) n += compareBits(x[k], y[k], `${path}/${k}`, mismatches);
    return n;
  }
  if (a && typeof a === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys((b as object) ?? {})]);
    let n = 0;
    for (const k of keys) n += compareBits((a as Record<string, unknown>)[k], (b as Record<string, unknown>)?.[k], `${path}/${k}`, mismatches);
    return n;
  }
  if (a !== b) mismatches.push(`${path}: ${String(a)} vs ${String(b)}`);
  return 0;
}

function runPool(jobs: MemberJob[], size: number, create: () => MemberWorkerLike) {
  const results: (MemberRunResult | undefined)[] = jobs.map(() => undefined);
  const starts: number[] = [];
  const progress = new Set<number>();
  const run = runExperimentPool(jobs, size, create, {
    onStart: (i) => starts.push(i),
    onProgress: (i) => progress.add(i),
    onResult: (i, r) => {
      expect(results[i], `member ${i} reported twice`).toBeUndefined();
      results[i] = r;
    },
  });
  return { run, results, starts, progress };
}

const jobs = ladderJobs();
// One at a time, in member order, on this thread: the reference.
const sequential = jobs.map((job) => runMember(job));
const tmp = mkdtempSync(join(tmpdir(), 'firnline-pool-cli-'));
afterAll(() => rmSync(tmp, { recursive: true, force: true }));

describe('experiment member run', () => {
  it('gives the command line its rows exactly: same outcomes.csv and experiment.csv text', () => {
    for (const [k, job] of jobs.entries()) {
      const cli = runMemberJob({ ...job, warnings: [], outDir: tmp, firnlineVersion: 'test', experimentDigest: 'test' });
      const ours = sequential[k];
      expect(cli.status).toBe('ok');
      if (ours.status !== 'ok') throw new Error(ours.message);
      expect(ours.outcomeRow).toBe(cli.outcomeRow);
      const s = ours.series;
      const numbers = Array.from(s.times, (time, i) => ({ time, volume: s.volume[i], area: s.area[i], length: s.length[i], terminus: s.terminus[i] }));
      expect(experimentRows(job.name, numbers as never)).toBe(cli.experimentRows);
    }
    // The warming ladder must actually differ member to member, or the comparison proves little.
    const ends = sequential.map((r) => (r.status === 'ok' ? r.outcome.volumeEnd : NaN));
    expect(new Set(ends).size).toBe(jobs.length);
  });
});

describe('experiment pool', () => {
  it('sizes the pool to the spare cores, at least 1, at most one per member', () => {
    expect(poolSize(8, 100)).toBe(7);
    expect(poolSize(8, 3)).toBe(3);
    expect(poolSize(1, 5)).toBe(1);
    expect(poolSize(2, 5)).toBe(1);
    expect(poolSize(undefined, 5)).toBe(1);
    expect(poolSize(4, 0)).toBe(1);
  });

  it('members run in parallel on worker threads are bit-identical to the same members run one at a time', async () => {
    const file = await bundleThreadWorker();
    const { run, results, progress } = runPool(jobs, 3, () => new ThreadMemberWorker(file));
    await expect(run.finished).resolves.toBe('done');
    const mismatches: string[] = [];
    const compared = compareBits(results, sequential, '', mismatches);
    console.info(`pool on 3 threads vs one at a time: ${compared} numbers compared, ${mismatches.length} differ`);
    expect(mismatches).toEqual([]);
    // Per member: 5 series x 5 outputs, 4 profile fields x 240 cells, the outcome's numbers.
    expect(compared).toBeGreaterThan(jobs.length * 900);
    expect(progress.size).toBe(jobs.length);
  }, 60_000);

  it('gives the same results with in-process workers interleaving their replies, whatever the pool size', async () => {
    for (const size of [1, 2, 4]) {
      const workers: InProcessMemberWorker[] = [];
      const { run, results, starts } = runPool(jobs, size, () => {
        const w = new InProcessMemberWorker();
        workers.push(w);
        return w;
      });
      await expect(run.finished).resolves.toBe('done');
      const mismatches: string[] = [];
      compareBits(results, sequential, '', mismatches);
      expect(mismatches, `pool of ${size}`).toEqual([]);
      expect(workers).toHaveLength(size);
      expect(starts.sort()).toEqual([0, 1, 2, 3]);
      // Finished workers are let go.
      expect(workers.every((w) => w.terminated)).toBe(true);
    }
  });

  it('cancel terminates every worker, resolves "cancelled" and ignores late replies', async () => {
    const workers: SilentMemberWorker[] = [];
    const reported: number[] = [];
    const run = runExperimentPool(jobs, 2, () => {
      const w = new SilentMemberWorker();
      workers.push(w);
      return w;
    }, { onResult: (i) => reported.push(i) });
    expect(workers).toHaveLength(2);
    expect(workers.map((w) => w.received.map((m) => m.job.index))).toEqual([[0], [1]]);
    run.cancel();
    await expect(run.finished).resolves.toBe('cancelled');
    expect(workers.every((w) => w.terminated)).toBe(true);
    // A reply already on its way when cancelled is dropped, and no further member is started.
    workers[0].emit({ type: 'result', index: 0, result: sequential[0] });
    expect(reported).toEqual([]);
    expect(workers.flatMap((w) => w.received)).toHaveLength(2);
  });

  it('a crashed worker fails only its member, with a message; a fresh worker finishes the others', async () => {
    let created = 0;
    // Whichever worker gets member 1 dies on it.
    const crashOn = new Set([1]);
    const { run, results } = runPool(jobs, 2, () => {
      created++;
      return new InProcessMemberWorker(crashOn);
    });
    await expect(run.finished).resolves.toBe('done');
    const failed = results[1]!;
    expect(failed.status).toBe('failed');
    if (failed.status === 'failed') {
      expect(failed.message).toMatch(/stopped unexpectedly \(out of memory \(simulated\)\)/);
      expect(failed.outcomeRow.startsWith(`${jobs[1].name},failed,`)).toBe(true);
    }
    const mismatches: string[] = [];
    for (const k of [0, 2, 3]) compareBits(results[k], sequential[k], `/${k}`, mismatches);
    expect(mismatches).toEqual([]);
    expect(created).toBe(3);
  });

  it('fails every member with the reason when no worker can be started', async () => {
    const { run, results } = runPool(jobs, 2, () => {
      throw new Error('Workers are disabled');
    });
    await expect(run.finished).resolves.toBe('done');
    for (const r of results) {
      expect(r?.status).toBe('failed');
      if (r?.status === 'failed') expect(r.message).toBe('this browser could not start a worker for the member (Workers are disabled)');
    }
  });
});
