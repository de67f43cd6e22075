/**
 * Messages between the main thread and the flowline worker. Typed both ways so that a change on
 * one side breaks the build on the other. Typed arrays in `frame` messages are transferred, not
 * copied: after posting, the worker no longer holds them.
 */
import type { GlacierNumbers, ProfileFields } from '../model/diagnostics';
import type { RunSummary } from '../model/runScenario';
import type { ValidScenario } from '../scenario/validateScenario';

/** Per-frame profile fields; x, bed and width do not change in a run and come once in `started`. */
export type FrameFields = Omit<ProfileFields, 'x' | 'bed' | 'width'>;

/** The fixed geometry of a run's grid, sent once. */
export interface RunGrid {
  /** Cell centres [m]. */
  x: Float64Array;
  /** Bed elevation at cell centres [m a.s.l.]. */
  bed: Float64Array;
  /** Width at cell centres [m]. */
  width: Float64Array;
  /** Domain length [m]. */
  length: number;
}

export type ToWorker =
  /** `paused`: start held, to be advanced with 'step' (step-by-step from the first output). */
  | { type: 'start'; runId: number; scenario: ValidScenario; paused?: boolean }
  | { type: 'pause'; runId: number }
  | { type: 'resume'; runId: number }
  | { type: 'stop'; runId: number }
  /** One output frame while paused. */
  | { type: 'step'; runId: number }
  /** Run a tiny built-in scenario so that the engine is compiled before the first real run. */
  | { type: 'warm-up' };

export type FromWorker =
  | { type: 'started'; runId: number; grid: RunGrid; years: number; spinUp: boolean }
  /** `thickness`: the glacier at that spin-up year [m], for a preview while the run has no output yet. */
  | { type: 'spinup-progress'; runId: number; year: number; of: number; thickness?: Float64Array }
  | { type: 'frame'; runId: number; time: number; fields: FrameFields; numbers: GlacierNumbers }
  | { type: 'paused'; runId: number }
  | { type: 'resumed'; runId: number }
  | { type: 'stopped'; runId: number }
  | { type: 'done'; runId: number; summary: RunSummary }
  /** The run could not go on; frames already sent stay valid. `year`/`position` locate a numerical failure. */
  | { type: 'failed'; runId: number; message: string; year?: number; position?: number };

/** The typed arrays of a frame, for postMessage's transfer list (each buffer once: a buffer
 * listed twice makes postMessage throw). */
export function frameTransferables(fields: FrameFields): ArrayBuffer[] {
  return [...new Set(Object.values(fields).map((a: Float64Array) => a.buffer as ArrayBuffer))];
}
