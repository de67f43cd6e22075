/**
 * The analysis worker's logic without the Worker: runs one stepwise analysis in short slices and
 * hears 'cancel' (or a new 'start') between them. Posting, yielding and the clock are injected,
 * so tests run it in Node with a hand-cranked scheduler, as runDriver.ts does for runs.
 */
import type { AnalysisProgress, AnalysisSteps } from '../model/analysis/stepwise';
import type { AnalysisResult, FromAnalysisWorker, ToAnalysisWorker } from './analysisProtocol';
import { analysisSteps } from './analysisJobs';
import { failureFields, sliceWaker } from './sliceWaker';
import { SLICE_MS, type Schedule } from './runDriver';

export type AnalysisPost = (message: FromAnalysisWorker) => void;

/** Least time between two progress messages [ms]: the panel need not redraw more often. */
export const PROGRESS_INTERVAL_MS = 100;

interface ActiveJob {
  jobId: number;
  steps: AnalysisSteps<AnalysisResult>;
  /** When progress was last posted [ms]. */
  reportedAt: number;
}

export interface AnalysisDriver {
  handle(message: ToAnalysisWorker): void;
}

export function createAnalysisDriver(post: AnalysisPost, schedule: Schedule, now: () => number = () => performance.now()): AnalysisDriver {
  let active: ActiveJob | undefined;
  // `slice` is defined below; the waker calls it only later, from the scheduler.
  const { wake } = sliceWaker(schedule, () => slice());

  const fail = (jobId: number, error: unknown) => {
    active = undefined;
    post({ type: 'failed', jobId, ...failureFields(error) });
  };

  const slice = () => {
    const job = active;
    if (!job) return;
    const start = now();
    let latest: AnalysisProgress | undefined;
    try {
      while (now() - start < SLICE_MS) {
        const next = job.steps.next();
        if (next.done) {
          active = undefined;
          post({ type: 'result', jobId: job.jobId, result: next.value });
          return;
        }
        latest = next.value;
      }
    } catch (error) {
      fail(job.jobId, error);
      return;
    }
    if (latest && now() - job.reportedAt >= PROGRESS_INTERVAL_MS) {
      job.reportedAt = now();
      post({ type: 'progress', jobId: job.jobId, progress: latest });
    }
    wake();
  };

  return {
    handle(message) {
      if (message.type === 'start') {
        // One job at a time: a new one replaces the one under way, which says it has stopped.
        if (active) post({ type: 'cancelled', jobId: active.jobId });
        active = undefined;
        try {
          active = { jobId: message.jobId, steps: analysisSteps(message.request), reportedAt: -Infinity };
        } catch (error) {
          fail(message.jobId, error);
          return;
        }
        wake();
        return;
      }
      if (active?.jobId !== message.jobId) return;
      active = undefined;
      post({ type: 'cancelled', jobId: message.jobId });
    },
  };
}
