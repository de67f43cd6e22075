/**
 * One experiment member in the browser, with the same pure code as `firnline experiment`:
 * runScenario, then per output time the glacier-wide numbers (diagnostics.glacierNumbers), the
 * outcome (runOutcome) and its outcomes.csv row (experimentCsv.outcomeRow). No DOM and no worker
 * API here, so tests run it in Node and compare it number for number with the pool.
 */
import { outcomeRow } from '../outputs/experimentCsv';
import { runOutcome, type RunOutcome } from '../model/analysis/runOutcome';
import { runScenario, type RunReport } from '../model/runScenario';
import type { FromMemberWorker, MemberJob, MemberProgress } from './experimentProtocol';
import { resultTransferables } from './experimentProtocol';
import { describeFailure } from '../outputs/failureText';

/** The member's numbers at each output time, as the columns of experiment.csv. */
export interface MemberSeries {
  /** Model year [a]. */
  times: Float64Array;
  /** [m^3] (per metre of width for a unit-width flowline). */
  volume: Float64Array;
  /** [m^2] */
  area: Float64Array;
  /** [m] */
  length: Float64Array;
  /** [m]; NaN when ice-free. */
  terminus: Float64Array;
}

/** The glacier at the end of the run, at cell centres. */
export interface MemberProfile {
  /** [m from the head of the valley] */
  x: Float64Array;
  /** [m a.s.l.] */
  bed: Float64Array;
  /** [m a.s.l.] */
  surface: Float64Array;
  /** [m] */
  thickness: Float64Array;
  /** The surface at year 0 (after any spin-up) [m a.s.l.], to compare the end with. */
  startSurface: Float64Array;
  /** Domain length [m]. */
  lengthM: number;
}

export type MemberRunResult =
  | { status: 'ok'; series: MemberSeries; finalProfile: MemberProfile; outcome: RunOutcome; outcomeRow: string; warnings: string[] }
  | { status: 'failed'; message: string; outcomeRow: string };

export function runMember(job: MemberJob, onProgress: (progress: MemberProgress) => void = () => undefined): MemberRunResult {
  let phase: 'spinup' | 'run' = job.scenario.spinup ? 'spinup' : 'run';
  let report: RunReport;
  try {
    report = runScenario(job.scenario, {
      onProgress: (p) => {
        phase = p.phase;
        onProgress(p);
      },
    });
  } catch (error) {
    const message = describeFailure(error, phase);
    return { status: 'failed', message, outcomeRow: outcomeRow(job.name, 'failed', undefined, message) };
  }
  const { model, frames } = report;
  const numbers = frames.map((f) => f.numbers);
  const pick = (f: (g: (typeof numbers)[number]) => number) => Float64Array.from(numbers, f);
  const last = frames[frames.length - 1];
  const thickness = Float64Array.from(last.fields.thickness);
  const bed = Float64Array.from(model.grid.bed);
  const outcome = runOutcome(report);
  return {
    status: 'ok',
    series: { times: pick((g) => g.time), volume: pick((g) => g.volume), area: pick((g) => g.area), length: pick((g) => g.length), terminus: pick((g) => g.terminus) },
    finalProfile: {
      x: Float64Array.from(model.grid.x),
      bed,
      surface: bed.map((b, i) => b + thickness[i]),
      thickness,
      startSurface: bed.map((b, i) => b + frames[0].fields.thickness[i]),
      lengthM: model.grid.cellCount * model.grid.spacing,
    },
    outcome,
    outcomeRow: outcomeRow(job.name, 'ok', outcome, ''),
    warnings: report.summary.warnings,
  };
}

export type PostFromMember = (message: FromMemberWorker, transfer: ArrayBuffer[]) => void;

/** Least time between two progress messages [ms]: a long run with many outputs must not flood the page. */
export const PROGRESS_INTERVAL_MS = 50;

/** What the member worker does with one job: progress messages, then the result. */
export function answerMemberJob(job: MemberJob, post: PostFromMember, now: () => number = Date.now): void {
  let last = -Infinity;
  const result = runMember(job, (progress) => {
    const t = now();
    if (t - last < PROGRESS_INTERVAL_MS) return;
    last = t;
    post({ type: 'progress', index: job.index, progress }, []);
  });
  post({ type: 'result', index: job.index, result }, resultTransferables(result));
}
