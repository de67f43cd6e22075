/**
 * Runs member jobs on a pool of worker threads (node:worker_threads), handing the next job to
 * whichever worker is free. Results are kept by member index, so the output order never depends
 * on which thread finished first. A worker that dies (out of memory, say) fails its member only;
 * a fresh worker takes over the rest.
 */
import { Worker } from 'node:worker_threads';
import { failure, type MemberJob, type MemberResult } from './experimentMember';

export function runInPool(
  jobs: readonly MemberJob[],
  threads: number,
  workerUrl: URL,
  onResult: (result: MemberResult) => void,
): Promise<MemberResult[]> {
  const results: MemberResult[] = [];
  let next = 0;
  let finished = 0;
  return new Promise((resolve) => {
    if (jobs.length === 0) return resolve(results);
    const position = new Map(jobs.map((job, k) => [job.index, k]));
    const done = (result: MemberResult) => {
      results[position.get(result.index)!] = result;
      finished++;
      onResult(result);
      if (finished === jobs.length) resolve(results);
    };
    const start = () => {
      const worker = new Worker(workerUrl);
      let current: MemberJob | undefined;
      const feed = () => {
        current = jobs[next++];
        if (current) worker.postMessage(current);
        else void worker.terminate();
      };
      worker.on('message', (result: MemberResult) => {
        current = undefined;
        done(result);
        feed();
      });
      worker.on('error', (error) => {
        const lost = current;
        current = undefined;
        if (lost) done(failure(lost, 'error', `the worker thread stopped: ${error.message}`));
        if (next < jobs.length) start();
      });
      feed();
    };
    for (let t = 0; t < Math.min(threads, jobs.length); t++) start();
  });
}
