/**
 * The two things every sliced worker driver does alike: ask for the next slice at most once at a
 * time (a second request before the first has run is dropped), and turn an error into the fields
 * of a 'failed' message (a numerical failure keeps its model year and position).
 */
import { NumericalFailure } from '../model/numericalFailure';

export type Schedule = (resume: () => void) => void;

/** `wake()` asks `schedule` for one run of `slice`; `wakeWith(other)` asks another scheduler. */
export function sliceWaker(schedule: Schedule, slice: () => void) {
  let scheduled = false;
  const wakeWith = (chosen: Schedule) => {
    if (scheduled) return;
    scheduled = true;
    chosen(() => {
      scheduled = false;
      slice();
    });
  };
  return { wake: () => wakeWith(schedule), wakeWith };
}

export function failureFields(error: unknown): { message: string; year?: number; position?: number } {
  if (error instanceof NumericalFailure) return { message: error.message, year: error.year, position: error.position };
  return { message: error instanceof Error ? error.message : String(error) };
}
