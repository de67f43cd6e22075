import { beforeEach, describe, expect, it } from 'vitest';
import { runStoreSink, useRunStore } from '../../src/state/runStore';
import type { FromWorker, ToWorker } from '../../src/worker/protocol';
import { WorkerClient, type RunSink, type WorkerLike } from '../../src/worker/workerClient';
import { runMessages, shortDemo } from '../state/runFixtures';

class FakeWorker implements WorkerLike {
  sent: ToWorker[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<FromWorker>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  onmessageerror: ((event: MessageEvent) => void) | null = null;
  postMessage(message: ToWorker) {
    this.sent.push(message);
  }
  terminate() {
    this.terminated = true;
  }
  emit(message: FromWorker) {
    this.onmessage?.({ data: message } as MessageEvent<FromWorker>);
  }
}

function setup() {
  const workers: FakeWorker[] = [];
  const flushes: (() => void)[] = [];
  const client = new WorkerClient(
    runStoreSink,
    () => {
      const w = new FakeWorker();
      workers.push(w);
      return w;
    },
    (cb) => flushes.push(cb),
    (cb) => flushes.push(cb),
  );
  const flush = () => flushes.splice(0).forEach((cb) => cb());
  return { client, workers, flush };
}

const store = () => useRunStore.getState();

beforeEach(() => store().reset());

describe('worker client', () => {
  it('creates the worker on the first run and sends the scenario with a new run id', () => {
    const { client, workers } = setup();
    expect(workers).toHaveLength(0);
    client.run(shortDemo, 3);
    expect(workers).toHaveLength(1);
    expect(workers[0].sent).toEqual([{ type: 'start', runId: 1, scenario: shortDemo, paused: undefined }]);
    expect(store().status).toBe('starting');
    expect(store().incoming?.revision).toBe(3);
    client.pause();
    client.step();
    client.resume();
    client.stop();
    expect(workers[0].sent.slice(1).map((m) => `${m.type}:${"runId" in m ? m.runId : "-"}`)).toEqual(['pause:1', 'step:1', 'resume:1', 'stop:1']);
    client.run(shortDemo, 4, { paused: true });
    expect(workers).toHaveLength(1);
    expect(workers[0].sent.at(-1)).toMatchObject({ type: 'start', runId: 2, paused: true });
  });

  it('hands a burst of messages to the store in one update on the next flush (the first frame jumps the throttle but still waits for an animation frame)', () => {
    const { client, workers, flush } = setup();
    client.run(shortDemo, 0);
    let updates = 0;
    const off = useRunStore.subscribe(() => updates++);
    for (const m of runMessages(shortDemo, 1)) workers[0].emit(m);
    expect(store().frames).toHaveLength(0);
    flush();
    off();
    expect(updates).toBe(1);
    expect(store().status).toBe('done');
    expect(store().frames.map((f) => f.time)).toEqual([0, 5, 10, 15, 20]);
  });

  it('notices a crashed worker, keeps the frames, tells the user and starts a fresh worker next time', () => {
    const { client, workers, flush } = setup();
    client.run(shortDemo, 0);
    const messages = runMessages(shortDemo, 1);
    for (const m of messages.slice(0, 3)) workers[0].emit(m);
    let prevented = false;
    workers[0].onerror?.({ message: 'out of memory', preventDefault: () => (prevented = true) } as unknown as ErrorEvent);
    flush();
    expect(prevented).toBe(true);
    expect(workers[0].terminated).toBe(true);
    expect(store().status).toBe('failed');
    expect(store().frames).toHaveLength(2);
    expect(store().notice).toBe(
      'The model stopped unexpectedly (out of memory). Your project is unchanged; frames computed so far are kept. Press Run to try again.',
    );
    client.run(shortDemo, 0);
    expect(workers).toHaveLength(2);
    expect(workers[1].sent[0]).toMatchObject({ type: 'start', runId: 2 });
    expect(store().notice).toBeNull();
  });

  it('treats an unreadable message as a crash', () => {
    const { client, workers } = setup();
    client.run(shortDemo, 0);
    workers[0].onmessageerror?.({} as MessageEvent);
    expect(store().notice).toMatch(/could not be read/);
    expect(workers[0].terminated).toBe(true);
  });

  it('says so when the browser cannot start a worker at all', () => {
    const client = new WorkerClient(runStoreSink, () => {
      throw new Error('Workers are disabled');
    });
    client.run(shortDemo, 0);
    expect(store().notice).toBe('The model could not be started in this browser (Workers are disabled).');
  });

  it('reports to the sink it is given and to nothing else', () => {
    const calls: string[] = [];
    const sink: RunSink = {
      begin: (runId, revision, years) => calls.push(`begin ${runId} ${revision} ${years}`),
      receive: (messages) => calls.push(`receive ${messages.map((m) => m.type).join(',')}`),
      workerLost: (notice) => calls.push(`lost ${notice}`),
    };
    const workers: FakeWorker[] = [];
    const flushes: (() => void)[] = [];
    const client = new WorkerClient(
      sink,
      () => {
        const w = new FakeWorker();
        workers.push(w);
        return w;
      },
      (cb) => flushes.push(cb),
      (cb) => flushes.push(cb),
    );
    client.run(shortDemo, 5);
    const [started, firstFrame] = runMessages(shortDemo, 1);
    workers[0].emit(started);
    workers[0].emit(firstFrame);
    flushes.splice(0).forEach((cb) => cb());
    workers[0].onmessageerror?.({} as MessageEvent);
    expect(calls).toEqual([
      'begin 1 5 20',
      'receive started,frame',
      'lost The model stopped unexpectedly (a message from the model worker could not be read). Your project is unchanged; frames computed so far are kept. Press Run to try again.',
    ]);
    expect(store().status).toBe('idle');
  });
});
