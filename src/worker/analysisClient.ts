/**
 * Main-thread side of the analysis worker: starts and cancels analyses and hands the worker's
 * messages to an AnalysisSink (the analysis store, wired in src/state). The worker is created on
 * the first analysis; one that crashes is replaced on the next. The project lives in other stores
 * and is never touched.
 */
import type { AnalysisKind, AnalysisRequest, FromAnalysisWorker, ToAnalysisWorker } from './analysisProtocol';
import { startWatchedWorker, type WorkerLike } from './watchedWorker';

/**
 * Where the client reports analyses. Passed in rather than imported so the worker folder depends
 * on no store: src/state/analysisStore.ts provides the app's.
 */
export interface AnalysisSink {
  /** 'start' is about to be sent for job `jobId`, made from scenario revision `revision`. */
  begin(kind: AnalysisKind, jobId: number, revision: number): void;
  receive(message: FromAnalysisWorker): void;
  /** The worker died or could not start: the analysis under way failed with this text. */
  lost(message: string): void;
  /** Whether an analysis is under way (cancel sends nothing otherwise). */
  busy(): boolean;
}

/** The part of a Worker the client uses; tests pass a fake. */
export type AnalysisWorkerLike = WorkerLike<ToAnalysisWorker, FromAnalysisWorker>;

export type CreateAnalysisWorker = () => AnalysisWorkerLike;

export const createAnalysisWorker: CreateAnalysisWorker = () =>
  new Worker(new URL('./analysis.worker.ts', import.meta.url), { type: 'module', name: 'analysis' }) as AnalysisWorkerLike;

export interface AnalysisClient {
  /** Starts an analysis made from scenario revision `revision`, replacing any under way. */
  start(request: AnalysisRequest, revision: number): void;
  /** Stops the analysis under way; its previous result, if any, stays. */
  cancel(): void;
}

export class AnalysisWorkerClient implements AnalysisClient {
  private worker: AnalysisWorkerLike | undefined;
  private jobId = 0;

  constructor(
    private readonly sink: AnalysisSink,
    private readonly createWorker: CreateAnalysisWorker = createAnalysisWorker,
  ) {}

  start(request: AnalysisRequest, revision: number): void {
    const worker = this.ensureWorker();
    this.jobId += 1;
    this.sink.begin(request.kind, this.jobId, revision);
    if (!worker) {
      this.sink.lost(`The analysis could not be started in this browser (${this.startProblem}).`);
      return;
    }
    // Copied, not transferred: the glacier sent for a committed change belongs to the run's frames.
    worker.postMessage({ type: 'start', jobId: this.jobId, request });
  }

  cancel(): void {
    if (this.sink.busy()) this.worker?.postMessage({ type: 'cancel', jobId: this.jobId });
  }

  private startProblem = '';

  private ensureWorker(): AnalysisWorkerLike | undefined {
    if (this.worker) return this.worker;
    const worker = startWatchedWorker(this.createWorker, 'the analysis worker', (data) => this.sink.receive(data), (lost, reason) => this.lose(lost, reason));
    if ('problem' in worker) {
      this.startProblem = worker.problem;
      return undefined;
    }
    this.worker = worker;
    return worker;
  }

  private lose(worker: AnalysisWorkerLike, reason: string): void {
    if (this.worker !== worker) return;
    worker.terminate();
    this.worker = undefined;
    this.sink.lost(`The analysis stopped unexpectedly (${reason}). Your project is unchanged; press the button again to retry.`);
  }
}
