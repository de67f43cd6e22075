/**
 * The one experiment validator, run where it does not hold up the page: on this thread for small
 * experiments (a few milliseconds), in a worker of its own for large ones (about 1 ms a member
 * for a valley like the demo, so 10,000 members take seconds). Where there are no workers (tests,
 * Node) it runs here.
 */
import { memberCount } from '../experiment/experimentMembers';
import type { Experiment } from '../experiment/experimentSchema';
import type { ExperimentValidation } from '../experiment/validateExperiment';
import { checkNow, type CheckRequest } from './experimentCheck';

export { checkNow, type CheckRequest };

/** Members checked on the page's own thread; more go to a worker. */
export const MEMBERS_CHECKED_HERE = 100;
/** Experiment text checked on the page's own thread [characters]; longer goes to a worker. */
const TEXT_CHECKED_HERE = 200_000;

function small(request: CheckRequest): boolean {
  if ('text' in request) return request.text.length <= TEXT_CHECKED_HERE;
  const e = request.experiment as Partial<Experiment> | null;
  const variants = Array.isArray(e?.variants) ? e.variants.length : 0;
  const sweep = e?.sweep && typeof e.sweep === 'object' ? Object.values(e.sweep) : [];
  // A malformed sweep is refused quickly by the schema, so it counts as small.
  if (!sweep.every(Array.isArray)) return true;
  return memberCount(variants, e?.sweep as Record<string, unknown[]> | undefined) <= MEMBERS_CHECKED_HERE;
}

export type Checker = (request: CheckRequest) => Promise<ExperimentValidation>;

function inWorker(request: CheckRequest): Promise<ExperimentValidation> {
  return new Promise((resolve) => {
    let worker: Worker;
    try {
      worker = new Worker(new URL('./experimentCheck.worker.ts', import.meta.url), { type: 'module', name: 'experiment-check' });
    } catch {
      resolve(checkNow(request));
      return;
    }
    const done = (result: ExperimentValidation) => {
      worker.terminate();
      resolve(result);
    };
    worker.onmessage = (event: MessageEvent<ExperimentValidation>) => done(event.data);
    worker.onerror = (event) => {
      event.preventDefault();
      done({ ok: false, errors: [{ path: '', message: `the experiment could not be checked (${event.message || 'the checking worker stopped'}); nothing was changed` }] });
    };
    worker.postMessage(request);
  });
}

export const checkExperiment: Checker = (request) =>
  small(request) || typeof Worker === 'undefined' ? Promise.resolve(checkNow(request)) : inWorker(request);
