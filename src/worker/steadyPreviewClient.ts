/**
 * Main-thread side of the steady-glacier preview worker: numbers each request (its generation),
 * posts it, and hands the worker's answers to a PreviewSink (the preview store, wired in
 * src/state). Cancelling an old request is the generation number's work: the worker drops a job
 * between two slices when a newer generation arrives, and the sink drops answers of any but the
 * latest. The worker is created on the first request; one that crashes is replaced on the next.
 */
import type { ValidScenario } from '../scenario/validateScenario';
import type { FromPreviewWorker, ToPreviewWorker } from './steadyPreviewProtocol';
import { startWatchedWorker, type WorkerLike } from './watchedWorker';

export interface PreviewSink {
  /** 'compute' is about to be sent for `generation`; `key` names what it computes. */
  begin(generation: number, key: string): void;
  /** Nothing is being computed any more (the preview was turned off or paused). */
  cancelled(generation: number): void;
  receive(message: FromPreviewWorker): void;
  /** The worker died or could not start. */
  lost(generation: number, message: string): void;
}

/** The part of a Worker the client uses; tests pass a fake. */
export type PreviewWorkerLike = WorkerLike<ToPreviewWorker, FromPreviewWorker>;

export type CreatePreviewWorker = () => PreviewWorkerLike;

export const createPreviewWorker: CreatePreviewWorker = () =>
  new Worker(new URL('./steadyPreview.worker.ts', import.meta.url), { type: 'module', name: 'steady-preview' }) as PreviewWorkerLike;

export interface PreviewClient {
  /** Computes the steady glacier of `scenario` (whose spin-up key is `key`), replacing any under way. */
  request(scenario: ValidScenario, key: string): void;
  /** Stops the computation under way, if any. */
  cancel(): void;
}

export class PreviewWorkerClient implements PreviewClient {
  private worker: PreviewWorkerLike | undefined;
  private generation = 0;
  private startProblem = '';

  constructor(
    private readonly sink: PreviewSink,
    private readonly createWorker: CreatePreviewWorker = createPreviewWorker,
  ) {}

  request(scenario: ValidScenario, key: string): void {
    this.generation += 1;
    this.sink.begin(this.generation, key);
    const worker = this.ensureWorker();
    if (!worker) {
      this.sink.lost(this.generation, `the preview could not be started in this browser (${this.startProblem})`);
      return;
    }
    worker.postMessage({ type: 'compute', generation: this.generation, scenario });
  }

  cancel(): void {
    this.generation += 1;
    this.worker?.postMessage({ type: 'cancel', generation: this.generation });
    this.sink.cancelled(this.generation);
  }

  private ensureWorker(): PreviewWorkerLike | undefined {
    if (this.worker) return this.worker;
    const worker = startWatchedWorker(this.createWorker, 'the preview worker', (data) => this.sink.receive(data), (lost, reason) => this.lose(lost, reason));
    if ('problem' in worker) {
      this.startProblem = worker.problem;
      return undefined;
    }
    this.worker = worker;
    return worker;
  }

  private lose(worker: PreviewWorkerLike, reason: string): void {
    if (this.worker !== worker) return;
    worker.terminate();
    this.worker = undefined;
    this.sink.lost(this.generation, `the preview stopped unexpectedly (${reason}); it starts again with the next edit`);
  }
}
