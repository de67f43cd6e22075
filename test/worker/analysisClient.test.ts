import { beforeEach, describe, expect, it } from 'vitest';
import { analysisStoreSink, useAnalysisStore } from '../../src/state/analysisStore';
import type { AnalysisRequest, FromAnalysisWorker, ToAnalysisWorker } from '../../src/worker/analysisProtocol';
import { AnalysisWorkerClient, type AnalysisSink, type AnalysisWorkerLike } from '../../src/worker/analysisClient';
import { testValley } from '../analysis/valley';
import { checked } from '../helpers/checkedScenario';

class FakeWorker implements AnalysisWorkerLike {
  sent: ToAnalysisWorker[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<FromAnalysisWorker>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  onmessageerror: ((event: MessageEvent) => void) | null = null;
  postMessage(message: ToAnalysisWorker) {
    this.sent.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  emit(message: FromAnalysisWorker) {
    this.onmessage?.({ data: message } as MessageEvent<FromAnalysisWorker>);
  }
}

function setup() {
  const workers: FakeWorker[] = [];
  const client = new AnalysisWorkerClient(analysisStoreSink, () => {
    const w = new FakeWorker();
    workers.push(w);
    return w;
  });
  return { client, workers };
}

const store = () => useAnalysisStore.getState();
const sensitivity: AnalysisRequest = { kind: 'sensitivity', scenario: checked(testValley()), from: 0, to: 1, step: 0.5 };
const calibration: AnalysisRequest = { kind: 'calibration', scenario: checked(testValley()), observedTerminus: 4000, tolerance: 50 };
const someResult = { kind: 'sensitivity' as const, points: [], from: 0, to: 1, step: 0.5, domainLength: 6000, spacing: 100 };

beforeEach(() => store().reset());

describe('analysis client and store', () => {
  it('creates the worker on the first analysis and marks it running with its revision', () => {
    const { client, workers } = setup();
    expect(workers).toHaveLength(0);
    client.start(sensitivity, 7);
    expect(workers).toHaveLength(1);
    expect(workers[0].sent).toEqual([{ type: 'start', jobId: 1, request: sensitivity }]);
    expect(store().active).toBe('sensitivity');
    expect(store().sensitivity).toMatchObject({ status: 'running', jobId: 1, revision: 7, progress: null });
  });

  it('shows progress, then the result, and frees the worker for the next analysis', () => {
    const { client, workers } = setup();
    client.start(sensitivity, 1);
    workers[0].emit({ type: 'progress', jobId: 1, progress: { fraction: 0.4, message: 'warming up' } });
    expect(store().sensitivity.progress).toEqual({ fraction: 0.4, message: 'warming up' });
    workers[0].emit({ type: 'result', jobId: 1, result: someResult });
    expect(store().sensitivity).toMatchObject({ status: 'done', result: someResult, progress: null });
    expect(store().active).toBeNull();
  });

  it('cancels the job under way; a late result of a cancelled job is ignored and the previous result kept', () => {
    const { client, workers } = setup();
    client.start(sensitivity, 1);
    workers[0].emit({ type: 'result', jobId: 1, result: someResult });
    client.start(sensitivity, 2);
    client.cancel();
    expect(workers[0].sent.at(-1)).toEqual({ type: 'cancel', jobId: 2 });
    workers[0].emit({ type: 'cancelled', jobId: 2 });
    expect(store().sensitivity.status).toBe('cancelled');
    expect(store().sensitivity.result).toBe(someResult);
    workers[0].emit({ type: 'result', jobId: 2, result: { ...someResult, step: 0.25 } });
    expect(store().sensitivity.result).toBe(someResult);
    // Cancel with nothing under way sends nothing.
    const before = workers[0].sent.length;
    client.cancel();
    expect(workers[0].sent).toHaveLength(before);
  });

  it('words a numerical failure with its model year and position', () => {
    const { client, workers } = setup();
    client.start(calibration, 1);
    workers[0].emit({ type: 'failed', jobId: 1, message: 'the time step collapsed', year: 12.25, position: 3450 });
    expect(store().calibration).toMatchObject({ status: 'failed', failure: 'the time step collapsed (model year 12.3, 3.45 km down-valley)' });
    expect(store().active).toBeNull();
  });

  it('replaces a crashed worker on the next analysis and says what happened', () => {
    const { client, workers } = setup();
    client.start(sensitivity, 1);
    workers[0].onerror?.({ message: 'out of memory', preventDefault: () => undefined } as ErrorEvent);
    expect(workers[0].terminated).toBe(true);
    expect(store().sensitivity.status).toBe('failed');
    expect(store().sensitivity.failure).toMatch(/^The analysis stopped unexpectedly \(out of memory\)\. Your project is unchanged/);
    client.start(sensitivity, 1);
    expect(workers).toHaveLength(2);
    expect(store().sensitivity.status).toBe('running');
  });

  it('says so when no worker can be created', () => {
    const client = new AnalysisWorkerClient(analysisStoreSink, () => {
      throw new Error('workers are disabled');
    });
    client.start(sensitivity, 1);
    expect(store().sensitivity).toMatchObject({ status: 'failed', failure: 'The analysis could not be started in this browser (workers are disabled).' });
    expect(store().active).toBeNull();
  });

  it('reports to the sink it is given and asks it whether there is anything to cancel', () => {
    const calls: string[] = [];
    let busy = false;
    const sink: AnalysisSink = {
      begin: (kind, jobId, revision) => calls.push(`begin ${kind} ${jobId} ${revision}`),
      receive: (message) => calls.push(`receive ${message.type} ${message.jobId}`),
      lost: (message) => calls.push(`lost ${message}`),
      busy: () => busy,
    };
    const workers: FakeWorker[] = [];
    const client = new AnalysisWorkerClient(sink, () => {
      const w = new FakeWorker();
      workers.push(w);
      return w;
    });
    client.start(sensitivity, 3);
    workers[0].emit({ type: 'progress', jobId: 1, progress: { fraction: 0.5, message: 'half' } });
    client.cancel();
    expect(workers[0].sent).toHaveLength(1);
    busy = true;
    client.cancel();
    expect(workers[0].sent.at(-1)).toEqual({ type: 'cancel', jobId: 1 });
    workers[0].onerror?.({ message: 'out of memory', preventDefault: () => undefined } as ErrorEvent);
    expect(calls).toEqual([
      'begin sensitivity 1 3',
      'receive progress 1',
      'lost The analysis stopped unexpectedly (out of memory). Your project is unchanged; press the button again to retry.',
    ]);
    expect(store().active).toBeNull();
  });
});
