/**
 * Messages between the main thread and the flowline worker. Typed both ways so that a change on
 * one side breaks the build on the other. Frames are copied (the run keeps its own for its
 * report); the spin-up previews and the grid are transferred.
 */
import type { DiagnosedFrame, RunGrid } from '../model/diagnostics';
import type { RunSummary } from '../model/runScenario';
import type { ValidScenario } from '../scenario/validateScenario';

export type { DiagnosedFrame, FrameFields, RunGrid } from '../model/diagnostics';

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
  /** One output, diagnosed once by the model (ScenarioRun.nextFrame). */
  | { type: 'frame'; runId: number; frame: DiagnosedFrame }
  | { type: 'paused'; runId: number }
  | { type: 'resumed'; runId: number }
  | { type: 'stopped'; runId: number }
  | { type: 'done'; runId: number; summary: RunSummary }
  /** The run could not go on; frames already sent stay valid. `year`/`position` locate a numerical failure. */
  | { type: 'failed'; runId: number; message: string; year?: number; position?: number };
