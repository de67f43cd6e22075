/**
 * Analyses in steps: each analysis is also written as a generator that yields its progress every
 * few model years, so a worker can run it in short slices, report progress and stop it between
 * slices. The plain functions run the same generator to its end, so both forms give one answer.
 */

export interface AnalysisProgress {
  /** Share of the work done, 0 to 1; undefined when the end cannot be foreseen. */
  fraction: number | undefined;
  /** What is being computed now, in words. */
  message: string;
}

export type AnalysisSteps<Result> = Generator<AnalysisProgress, Result, void>;

/** Runs a stepwise analysis to its end and returns its result. */
export function runToEnd<Result>(steps: Generator<unknown, Result, void>): Result {
  for (;;) {
    const next = steps.next();
    if (next.done) return next.value;
  }
}
