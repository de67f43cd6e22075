/**
 * The state of the current model run, fed by the worker client: status, progress, the frames
 * received so far and the scenario revision they were made from (results of an older revision
 * are stale). Holds no worker: transitions are plain functions of messages, tested without one.
 */
import { create } from 'zustand';
import type { DiagnosedFrame } from '../model/diagnostics';
import type { RunSummary } from '../model/runScenario';
import type { FromWorker, RunGrid } from '../worker/protocol';
import type { RunSink } from '../worker/workerClient';
import { useScenarioStore } from './scenarioStore';

/**
 * Memory the frames of one run may take [bytes]. Beyond it every other frame is dropped (the first
 * and the newest kept) and the run says so: a 100,000-year run at fine resolution stays bounded.
 */
export const FRAME_MEMORY_BUDGET_BYTES = 256 * 1024 * 1024;
/** Fewest frames kept, whatever the grid. */
const MIN_FRAMES_KEPT = 64;

/** How many frames of `cells` cells fit in the budget (8 float64 fields a frame). */
export function maxFramesFor(cells: number): number {
  return Math.max(MIN_FRAMES_KEPT, Math.floor(FRAME_MEMORY_BUDGET_BYTES / (cells * 8 * 8)));
}

/** Every other frame, keeping the first and the last. */
export function thinFrames<T>(frames: readonly T[]): T[] {
  const kept = frames.filter((_, k) => k % 2 === 0);
  if ((frames.length - 1) % 2 !== 0) kept.push(frames[frames.length - 1]);
  return kept;
}

export type RunStatus = 'idle' | 'starting' | 'spinning-up' | 'running' | 'paused' | 'stopped' | 'done' | 'failed';

/** A frame of the run as the model diagnosed it (the one frame type, model/diagnostics.ts). */
export type RunFrame = DiagnosedFrame;

export interface RunProgress {
  phase: 'spinup' | 'run';
  /** Model years reached in this phase [a]. */
  year: number;
  /** Spin-up: the most it may take (it stops earlier at a steady state); run: its length [a]. */
  of: number;
}

export interface RunFailure {
  message: string;
  /** Model year of a numerical failure [a]. */
  year?: number;
  /** Position along the flowline [m]. */
  position?: number;
}

/** Largest values over the frames so far, so that plot axes hold still during playback. */
export interface RunRanges {
  maxSurface: number;
  maxSpeed: number;
  maxStress: number;
  minEla: number;
  maxEla: number;
}

export interface RunState {
  status: RunStatus;
  runId: number;
  /** scenarioStore revision the results were made from; null before any run. */
  revision: number | null;
  grid: RunGrid | null;
  /** Length of the run [a]. */
  years: number;
  progress: RunProgress | null;
  frames: RunFrame[];
  ranges: RunRanges | null;
  summary: RunSummary | null;
  failure: RunFailure | null;
  /** 1 while every output is kept; k when only every k-th is (memory budget). */
  thinning: number;
  /** The glacier during the spin-up, shown until the run's first output. */
  spinUpPreview: { year: number; thickness: Float64Array } | null;
  /** Something the user should know that is not a model failure (a crashed worker). */
  notice: string | null;
  /**
   * The run under way until its first frame: until then the previous run's frames stay on
   * screen, so the views do not blank out and the page does not jump at every new run.
   */
  incoming: { revision: number; years: number; grid: RunGrid | null } | null;
  /** A run was asked for; the client has sent 'start'. */
  begin: (runId: number, revision: number, years: number) => void;
  /** Applies worker messages in order, as one update. */
  receive: (messages: FromWorker[]) => void;
  /** The worker died: keep the frames, stop the run, say so. */
  workerLost: (notice: string) => void;
  reset: () => void;
}

const IDLE = {
  status: 'idle' as RunStatus,
  revision: null,
  grid: null,
  years: 0,
  progress: null,
  frames: [],
  ranges: null,
  summary: null,
  failure: null,
  thinning: 1,
  spinUpPreview: null,
  notice: null,
  incoming: null,
};

export const useRunStore = create<RunState>()((set, get) => ({
  ...IDLE,
  runId: 0,
  begin(runId, revision, years) {
    set({
      status: 'starting',
      runId,
      progress: null,
      summary: null,
      failure: null,
      spinUpPreview: null,
      notice: null,
      incoming: { revision, years, grid: null },
    });
  },
  receive(messages) {
    const state = get();
    let { status, progress, ranges, summary, failure, grid, revision, years, incoming, frames, spinUpPreview, thinning } = state;
    let added: RunFrame[] | undefined;
    // The new run's results replace the old ones at its first frame, or when it ends without one.
    const adopt = () => {
      if (!incoming) return;
      ({ revision, years, grid } = incoming);
      frames = [];
      ranges = null;
      incoming = null;
      thinning = 1;
    };
    for (const m of messages) {
      if (m.runId !== state.runId) continue;
      switch (m.type) {
        case 'started':
          if (incoming) incoming = { ...incoming, grid: m.grid };
          else grid = m.grid;
          status = m.spinUp ? 'spinning-up' : 'running';
          progress = m.spinUp ? { phase: 'spinup', year: 0, of: 0 } : { phase: 'run', year: 0, of: m.years };
          break;
        case 'spinup-progress':
          progress = { phase: 'spinup', year: m.year, of: m.of };
          if (m.thickness) spinUpPreview = { year: m.year, thickness: m.thickness };
          break;
        case 'frame': {
          adopt();
          spinUpPreview = null;
          // A frame object of this run's own: playback tells runs apart by their first frame.
          const frame = { ...m.frame };
          (added ??= []).push(frame);
          ranges = widenRanges(ranges, frame);
          progress = { phase: 'run', year: frame.time, of: years };
          if (status === 'spinning-up') status = 'running';
          break;
        }
        case 'paused':
          status = 'paused';
          break;
        case 'resumed':
          status = progress?.phase === 'spinup' ? 'spinning-up' : 'running';
          break;
        case 'stopped':
          adopt();
          status = 'stopped';
          break;
        case 'done':
          adopt();
          status = 'done';
          summary = m.summary;
          break;
        case 'failed':
          adopt();
          status = 'failed';
          failure = { message: m.message, year: m.year, position: m.position };
          break;
      }
    }
    if (added) {
      frames = [...frames, ...added];
      const most = maxFramesFor(frames[0].fields.thickness.length);
      while (frames.length > most) {
        frames = thinFrames(frames);
        thinning *= 2;
      }
    }
    set({ status, progress, ranges, summary, failure, grid, frames, revision, years, incoming, spinUpPreview, thinning });
  },
  workerLost(notice) {
    const { status, incoming } = get();
    const wasActive = isActive(status);
    set({
      notice,
      status: wasActive ? 'failed' : status,
      failure: wasActive ? { message: notice } : get().failure,
      // A run lost before its first frame replaces the old results with none.
      ...(wasActive && incoming ? { frames: [], ranges: null, grid: incoming.grid, revision: incoming.revision, years: incoming.years, incoming: null } : {}),
    });
  },
  reset() {
    // Messages still on their way from the dropped run no longer match and are ignored.
    set({ ...IDLE, runId: -1 });
  },
}));

function widenRanges(r: RunRanges | null, frame: RunFrame): RunRanges {
  const { fields, numbers } = frame;
  let maxSurface = -Infinity;
  let maxSpeed = 0;
  let maxStress = 0;
  for (let i = 0; i < fields.surface.length; i++) {
    maxSurface = Math.max(maxSurface, fields.surface[i]);
    maxSpeed = Math.max(maxSpeed, Math.abs(fields.surfaceSpeed[i]));
    maxStress = Math.max(maxStress, fields.drivingStress[i]);
  }
  const ela = Number.isFinite(numbers.ela) ? numbers.ela : undefined;
  return {
    maxSurface: Math.max(r?.maxSurface ?? -Infinity, maxSurface),
    maxSpeed: Math.max(r?.maxSpeed ?? 0, maxSpeed),
    maxStress: Math.max(r?.maxStress ?? 0, maxStress),
    minEla: Math.min(r?.minEla ?? Infinity, ela ?? Infinity),
    maxEla: Math.max(r?.maxEla ?? -Infinity, ela ?? -Infinity),
  };
}

/** Results exist but were made from an earlier version of the scenario. */
export function useResultsStale(): boolean {
  const made = useRunStore((s) => s.revision);
  const current = useScenarioStore((s) => s.revision);
  return made !== null && made !== current;
}

/** Whether the worker is busy with (or holding, paused) a run. */
export function isActive(status: RunStatus): boolean {
  return status === 'starting' || status === 'spinning-up' || status === 'running' || status === 'paused';
}

/** The run store as the worker client's sink: each call reads the store afresh. */
export const runStoreSink: RunSink = {
  begin: (runId, revision, years) => useRunStore.getState().begin(runId, revision, years),
  receive: (messages) => useRunStore.getState().receive(messages),
  workerLost: (notice) => useRunStore.getState().workerLost(notice),
};
