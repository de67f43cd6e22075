/**
 * Main-thread side of the flowline worker. Starts runs, forwards pause/resume/stop/step, and
 * hands the worker's messages to a RunSink (the run store, wired in src/state) at most once per
 * animation frame, so a burst of frames costs one render. A worker that crashes is replaced by a
 * fresh one on the next run; the project itself lives in other stores and is never touched.
 */
import type { ValidScenario } from '../scenario/validateScenario';
import type { FromWorker, ToWorker } from './protocol';

/**
 * Where the client reports a run. The sink is passed in rather than imported so the worker folder
 * depends on no store: src/state/runStore.ts provides the app's.
 */
export interface RunSink {
  /** A run was asked for; 'start' has been sent. */
  begin(runId: number, revision: number, years: number): void;
  /** Worker messages in order, to apply as one update. */
  receive(messages: FromWorker[]): void;
  /** The worker could not start or died; `notice` says so to the user. */
  workerLost(notice: string): void;
}

/** The part of a Worker the client uses; tests pass a fake. */
export interface WorkerLike {
  postMessage(message: ToWorker): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<FromWorker>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror: ((event: MessageEvent) => void) | null;
}

export type CreateWorker = () => WorkerLike;

export const createFlowlineWorker: CreateWorker = () =>
  new Worker(new URL('./flowline.worker.ts', import.meta.url), { type: 'module', name: 'flowline' }) as WorkerLike;

export interface RunClient {
  /** `options.paused`: start held, for stepping one output at a time from the start. */
  run(scenario: ValidScenario, revision: number, options?: { paused?: boolean }): void;
  pause(): void;
  resume(): void;
  stop(): void;
  step(): void;
  /** Optional: get ready for a first run (start the worker, compile the engine). */
  prepare?(): void;
}

type Flush = (callback: () => void) => void;

/** Least time between two updates of the views while a run streams in [ms]. */
export const MIN_UPDATE_INTERVAL_MS = 100;

function nextAnimationFrame(callback: () => void): void {
  if (typeof requestAnimationFrame === 'function') requestAnimationFrame(callback);
  else setTimeout(callback, 0);
}

/**
 * Calls back on an animation frame at least MIN_UPDATE_INTERVAL_MS after the previous update:
 * a redraw of every view costs tens of milliseconds on a slow machine, so ten a second keeps the
 * page responsive while the run still visibly moves.
 */
function throttledAnimationFrame(): Flush {
  let last = -Infinity;
  return (callback) => {
    const wait = Math.max(0, last + MIN_UPDATE_INTERVAL_MS - performance.now());
    setTimeout(() => {
      const draw = () => {
        last = performance.now();
        callback();
      };
      if (typeof requestAnimationFrame === 'function') requestAnimationFrame(draw);
      else draw();
    }, wait);
  };
}

export class WorkerClient implements RunClient {
  private worker: WorkerLike | undefined;
  private runId = 0;
  private queue: FromWorker[] = [];
  private flushScheduled = false;
  /** Whether the current run's first glacier has gone to the views (it skips the throttle). */
  private firstFrameShown = false;

  constructor(
    private readonly sink: RunSink,
    private readonly createWorker: CreateWorker = createFlowlineWorker,
    private readonly flush: Flush = throttledAnimationFrame(),
    /** How the first frame of a run is delivered: on the next animation frame, unthrottled. */
    private readonly soon: Flush = nextAnimationFrame,
  ) {}

  run(scenario: ValidScenario, revision: number, options: { paused?: boolean } = {}): void {
    const worker = this.ensureWorker();
    if (!worker) return;
    this.runId += 1;
    this.queue = [];
    this.firstFrameShown = false;
    this.sink.begin(this.runId, revision, scenario.run.years);
    worker.postMessage({ type: 'start', runId: this.runId, scenario, paused: options.paused });
  }

  /** Starts the worker and compiles the engine ahead of the first run (called when the page is idle). */
  prepare(): void {
    // Quietly: where workers are unavailable, the first real run says so.
    if (this.worker || typeof Worker === 'undefined') return;
    this.ensureWorker()?.postMessage({ type: 'warm-up' });
  }

  pause(): void {
    this.send('pause');
  }

  resume(): void {
    this.send('resume');
  }

  stop(): void {
    this.send('stop');
  }

  step(): void {
    this.send('step');
  }

  private send(type: 'pause' | 'resume' | 'stop' | 'step'): void {
    this.worker?.postMessage({ type, runId: this.runId });
  }

  private ensureWorker(): WorkerLike | undefined {
    if (this.worker) return this.worker;
    let worker: WorkerLike;
    try {
      worker = this.createWorker();
    } catch (error) {
      this.sink.workerLost(`The model could not be started in this browser (${describe(error)}).`);
      return undefined;
    }
    worker.onmessage = (event) => this.enqueue(event.data);
    worker.onerror = (event) => {
      event.preventDefault?.();
      this.lose(worker, event.message || 'an error in the model worker');
    };
    worker.onmessageerror = () => this.lose(worker, 'a message from the model worker could not be read');
    this.worker = worker;
    return worker;
  }

  private enqueue(message: FromWorker): void {
    this.queue.push(message);
    const showsGlacier = message.type === 'frame' || (message.type === 'spinup-progress' && message.thickness !== undefined);
    if (showsGlacier && message.runId === this.runId && !this.firstFrameShown) {
      // The first glacier of a run (spin-up preview or output) answers "did Run do anything?":
      // show it on the next animation frame, unthrottled.
      this.firstFrameShown = true;
      this.deliver();
      return;
    }
    if (this.flushScheduled) return;
    this.flushScheduled = true;
    this.flush(() => {
      this.flushScheduled = false;
      this.deliverNow();
    });
  }

  private deliver(): void {
    this.soon(() => this.deliverNow());
  }

  private deliverNow(): void {
    const messages = this.queue;
    this.queue = [];
    if (messages.length) this.sink.receive(messages);
  }

  /** Drops a broken worker; the next run gets a fresh one. */
  private lose(worker: WorkerLike, reason: string): void {
    if (this.worker !== worker) return;
    worker.terminate();
    this.worker = undefined;
    const pending = this.queue;
    this.queue = [];
    if (pending.length) this.sink.receive(pending);
    this.sink.workerLost(`The model stopped unexpectedly (${reason}). Your project is unchanged; frames computed so far are kept. Press Run to try again.`);
  }
}

function describe(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
