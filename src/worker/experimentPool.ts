/**
 * Runs experiment members on a pool of workers, handing the next member to whichever worker is
 * free (as the command line's pool does with threads). The Worker itself is injected, so the
 * logic is tested in Node with workers that are plain objects. Results are reported by member
 * index, so nothing depends on which worker finished first. A worker that dies fails only the
 * member it was running; a fresh worker takes over the rest. Cancel terminates every worker.
 */
import type { FromMemberWorker, MemberJob, MemberProgress, ToMemberWorker } from './experimentProtocol';
import type { MemberRunResult } from './experimentMemberRun';
import { outcomeRow } from '../outputs/experimentCsv';

/** The part of a Worker the pool uses. */
export interface MemberWorkerLike {
  postMessage(message: ToMemberWorker): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<FromMemberWorker>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror: ((event: MessageEvent) => void) | null;
}

export type CreateMemberWorker = () => MemberWorkerLike;

export interface PoolCallbacks {
  /** A worker has been handed the member. */
  onStart?: (index: number) => void;
  onProgress?: (index: number, progress: MemberProgress) => void;
  /** Exactly once per member that finished (a failure is a result too), unless cancelled first. */
  onResult: (index: number, result: MemberRunResult) => void;
}

export interface PoolRun {
  /** Stops at once: every worker is terminated; members not finished get no result. */
  cancel(): void;
  /** 'done' when every member has a result, 'cancelled' after cancel(). */
  finished: Promise<'done' | 'cancelled'>;
}

/** One worker per spare core (one core is left to the page), at least 1, at most one per member. */
export function poolSize(hardwareConcurrency: number | undefined, members: number): number {
  const cores = Number.isFinite(hardwareConcurrency) && (hardwareConcurrency as number) > 0 ? Math.floor(hardwareConcurrency as number) : 2;
  return Math.max(1, Math.min(cores - 1, members));
}

function failed(job: MemberJob, message: string): MemberRunResult {
  return { status: 'failed', message, outcomeRow: outcomeRow(job.name, 'failed', undefined, message) };
}

export function runExperimentPool(jobs: readonly MemberJob[], size: number, createWorker: CreateMemberWorker, callbacks: PoolCallbacks): PoolRun {
  const workers = new Set<MemberWorkerLike>();
  let next = 0;
  let finishedCount = 0;
  let over = false;
  let settle: (how: 'done' | 'cancelled') => void = () => undefined;
  const finished = new Promise<'done' | 'cancelled'>((resolve) => (settle = resolve));

  const end = (how: 'done' | 'cancelled') => {
    if (over) return;
    over = true;
    for (const w of workers) w.terminate();
    workers.clear();
    settle(how);
  };

  const report = (job: MemberJob, result: MemberRunResult) => {
    if (over) return;
    finishedCount++;
    callbacks.onResult(job.index, result);
    if (finishedCount === jobs.length) end('done');
  };

  const start = () => {
    if (over || next >= jobs.length) return;
    let worker: MemberWorkerLike;
    try {
      worker = createWorker();
    } catch (error) {
      // No worker at all: every member still waiting fails with the reason, so none is lost silently.
      if (workers.size === 0) {
        const reason = `this browser could not start a worker for the member (${error instanceof Error ? error.message : String(error)})`;
        while (next < jobs.length) {
          const job = jobs[next++];
          report(job, failed(job, reason));
        }
      }
      return;
    }
    workers.add(worker);
    let current: MemberJob | undefined;
    const feed = () => {
      current = jobs[next++];
      if (current) {
        callbacks.onStart?.(current.index);
        worker.postMessage({ type: 'run', job: current });
      } else {
        workers.delete(worker);
        worker.terminate();
      }
    };
    const lose = (reason: string) => {
      if (over || !workers.has(worker)) return;
      workers.delete(worker);
      worker.terminate();
      const lost = current;
      current = undefined;
      if (lost) report(lost, failed(lost, `the worker running this member stopped unexpectedly (${reason}); the other members are not affected`));
      start();
    };
    worker.onmessage = (event) => {
      const message = event.data;
      if (over || !current || message.index !== current.index) return;
      if (message.type === 'progress') {
        callbacks.onProgress?.(message.index, message.progress);
        return;
      }
      const job = current;
      current = undefined;
      report(job, message.result);
      feed();
    };
    worker.onerror = (event) => {
      event.preventDefault?.();
      lose(event.message || 'an error in the worker');
    };
    worker.onmessageerror = () => lose('a message from the worker could not be read');
    feed();
  };

  if (jobs.length === 0) end('done');
  for (let k = 0; k < Math.min(size, jobs.length); k++) start();
  return { cancel: () => end('cancelled'), finished };
}
