/**
 * The worker's logic without the Worker: drives a ScenarioRun in short slices, answering pause,
 * resume, stop and step between them. Posting and yielding are injected, so tests run it in Node
 * with a hand-cranked scheduler. Diagnostics are computed here so the main thread only draws.
 */
import { runGrid } from '../model/diagnostics';
import { ScenarioRun, spinUpKey } from '../model/runScenario';
import type { Scenario } from '../model/scenario';
import type { SpinUpResult } from '../model/spinUp';
import type { FromWorker, ToWorker } from './protocol';
import { failureFields, sliceWaker, type Schedule } from './sliceWaker';

export type Post = (message: FromWorker, transfer: ArrayBuffer[]) => void;
/** Calls `resume` later, after pending messages have been handled. */
export type { Schedule };

/** Wall-clock work per slice before yielding [ms]; a 10-year spin-up slice may overrun it once. */
export const SLICE_MS = 15;
/** Model years per spin-up call; the spin-up checks for a steady state every 10 years. */
const SPINUP_CHUNK_YEARS = 10;

/** Spin-ups kept for reuse ("Run again" after changing only the warming or the run length). */
const SPINUP_CACHE_SIZE = 4;

/** A small invented valley run once when the page opens, so the engine is compiled before Run. */
const WARM_UP_SCENARIO: Scenario = {
  format: 'firnline-scenario',
  version: 1,
  grid: { length: 3000, spacing: 50 },
  bed: [[0, 3000], [3000, 2700]],
  surface: [[0, 3080], [2000, 2820], [2100, 2790], [2200, 2700]],
  ice: { n: 3, A: 2.4e-24 },
  sliding: { C: 1e-14, m: 3 },
  shapeFactor: { crossSection: 'parabolic' },
  width: [[0, 800], [3000, 500]],
  massBalance: { model: 'linear', ela: 2900, ablationGradient: 0.006 },
  spinup: true,
  warming: [[0, 0], [50, 1]],
  // Long enough for the compiler to optimise the stepping code (a few thousand Newton iterations).
  run: { years: 150, outputEvery: 50 },
};

interface ActiveRun {
  runId: number;
  run: ScenarioRun;
  spinUpKey: string;
  paused: boolean;
  /** Frames asked for with 'step' while paused. */
  steps: number;
  /** The finished spin-up has gone into the cache. */
  spinUpKept: boolean;
}

export interface RunDriver {
  handle(message: ToWorker): void;
}

export function createRunDriver(
  post: Post,
  schedule: Schedule,
  now: () => number = () => performance.now(),
  /**
   * How the first slice waits after the run's first state is posted. The worker shell gives the
   * page a short pause here: on a 2-core machine the page draws and rasterises that state on the
   * one core the engine is not using, and a busy engine would compete with it.
   */
  afterFirstState: Schedule = schedule,
): RunDriver {
  let active: ActiveRun | undefined;
  // `slice` is defined below; the waker calls it only later, from the scheduler.
  const { wake, wakeWith } = sliceWaker(schedule, () => slice());
  const spinUps = new Map<string, SpinUpResult>();

  const remember = (key: string, result: SpinUpResult) => {
    spinUps.delete(key);
    spinUps.set(key, { ...result, thickness: Float64Array.from(result.thickness) });
    if (spinUps.size > SPINUP_CACHE_SIZE) spinUps.delete(spinUps.keys().next().value as string);
  };

  const fail = (runId: number, error: unknown) => {
    active = undefined;
    post({ type: 'failed', runId, ...failureFields(error) }, []);
  };

  const slice = () => {
    const current = active;
    if (!current) return;
    const { run, runId } = current;
    const start = now();
    try {
      let spinUpMoved = false;
      while (now() - start < SLICE_MS) {
        if (current.paused && current.steps === 0) break;
        if (!run.advanceSpinUp(SPINUP_CHUNK_YEARS)) {
          spinUpMoved = true;
          continue;
        }
        if (spinUpMoved) {
          post({ type: 'spinup-progress', runId, year: run.spinUpYears, of: run.spinUpMaxYears }, []);
          spinUpMoved = false;
        }
        // Kept for "Run again" once the spin-up is over, whichever slice finished it.
        if (!current.spinUpKept) {
          current.spinUpKept = true;
          const spun = run.spinUpResult();
          if (spun) remember(current.spinUpKey, spun);
        }
        const frame = run.nextFrame();
        if (frame) {
          // Copied, not transferred: the run keeps its frames for its report. x, bed and width
          // belong to the model's grid and were sent once in 'started'.
          post({ type: 'frame', runId, frame }, []);
          if (current.steps > 0) current.steps--;
        }
        if (run.complete) {
          active = undefined;
          post({ type: 'done', runId, summary: run.report().summary }, []);
          return;
        }
      }
      if (spinUpMoved) {
        const thickness = run.spinUpThickness();
        post({ type: 'spinup-progress', runId, year: run.spinUpYears, of: run.spinUpMaxYears, thickness }, thickness ? [thickness.buffer as ArrayBuffer] : []);
      }
    } catch (error) {
      fail(runId, error);
      return;
    }
    if (!current.paused || current.steps > 0) wake();
  };

  const start = (runId: number, message: Extract<ToWorker, { type: 'start' }>) => {
    let run: ScenarioRun;
    let key: string;
    try {
      key = spinUpKey(message.scenario);
      run = new ScenarioRun(message.scenario, { reuseSpinUp: spinUps.get(key) });
    } catch (error) {
      fail(runId, error);
      return;
    }
    active = { runId, run, spinUpKey: key, paused: Boolean(message.paused), steps: 0, spinUpKept: false };
    const grid = runGrid(run.model);
    const x = Float64Array.from(grid.x);
    const bed = Float64Array.from(grid.bed);
    const width = Float64Array.from(grid.width);
    post(
      {
        type: 'started',
        runId,
        grid: { x, bed, width, length: grid.length, ...(grid.section ? { section: grid.section } : {}) },
        years: message.scenario.run.years,
        spinUp: Boolean(message.scenario.spinup),
      },
      [x.buffer, bed.buffer, width.buffer],
    );
    // The glacier the spin-up starts from, at once: the first thing on screen after Run.
    const initial = run.spinUpThickness();
    if (initial) post({ type: 'spinup-progress', runId, year: 0, of: run.spinUpMaxYears, thickness: initial }, [initial.buffer as ArrayBuffer]);
    if (message.paused) post({ type: 'paused', runId }, []);
    else if (initial) wakeWith(afterFirstState);
    else wake();
  };

  return {
    handle(message) {
      if (message.type === 'warm-up') {
        // Compile the engine while the user looks at the page; nothing is posted.
        if (!active) {
          const run = new ScenarioRun(WARM_UP_SCENARIO);
          while (run.nextFrame());
        }
        return;
      }
      if (message.type === 'start') {
        start(message.runId, message);
        return;
      }
      const current = active;
      // Messages about a run that has ended or been replaced are answered by nothing.
      if (!current || current.runId !== message.runId) return;
      switch (message.type) {
        case 'pause':
          current.paused = true;
          post({ type: 'paused', runId: current.runId }, []);
          break;
        case 'resume':
          current.paused = false;
          post({ type: 'resumed', runId: current.runId }, []);
          wake();
          break;
        case 'step':
          if (current.paused) {
            current.steps++;
            wake();
          }
          break;
        case 'stop':
          active = undefined;
          post({ type: 'stopped', runId: current.runId }, []);
          break;
      }
    },
  };
}
