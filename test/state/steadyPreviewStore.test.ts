// @vitest-environment jsdom
/**
 * The preview store with its client over a fake worker: each request gets a new generation, an
 * answer of an older generation is dropped (nothing stale is shown), a cancel leaves the last
 * glacier, refusals are counted per field, and the on/off choice is kept in localStorage.
 */
import { beforeEach, describe, expect, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { steadyGlacierSteps } from '../../src/model/steadyGlacier';
import { STEADY_PREVIEW_SETTING, steadyPreviewSink, useSteadyPreviewStore } from '../../src/state/steadyPreviewStore';
import { PreviewWorkerClient, type PreviewWorkerLike } from '../../src/worker/steadyPreviewClient';
import type { ToPreviewWorker } from '../../src/worker/steadyPreviewProtocol';
import { checkedJson } from '../helpers/checkedScenario';
import { resetStores } from '../helpers/resetStores';

const scenario = checkedJson(demo);
const glacier = runToEnd(steadyGlacierSteps(scenario));

function fakeWorker() {
  const sent: ToPreviewWorker[] = [];
  const worker: PreviewWorkerLike = {
    postMessage: (m) => sent.push(m),
    terminate: () => undefined,
    onmessage: null,
    onerror: null,
    onmessageerror: null,
  };
  const answer = (generation: number) => worker.onmessage?.({ data: { type: 'result', generation, glacier } } as MessageEvent);
  return { worker, sent, answer };
}

beforeEach(() => {
  localStorage.clear();
  resetStores();
});

describe('steady-glacier preview store and client', () => {
  it('numbers requests and shows only the answer to the latest', () => {
    const fake = fakeWorker();
    const client = new PreviewWorkerClient(steadyPreviewSink, () => fake.worker);
    client.request(scenario, 'key-a');
    client.request(scenario, 'key-b');
    expect(fake.sent.map((m) => [m.type, m.generation])).toEqual([
      ['compute', 1],
      ['compute', 2],
    ]);
    expect(useSteadyPreviewStore.getState()).toMatchObject({ status: 'computing', generation: 2, key: 'key-b' });
    fake.answer(1); // late answer to the replaced request
    expect(useSteadyPreviewStore.getState()).toMatchObject({ status: 'computing', glacier: null });
    fake.answer(2);
    expect(useSteadyPreviewStore.getState()).toMatchObject({ status: 'ready', glacierKey: 'key-b' });
    expect(useSteadyPreviewStore.getState().glacier?.terminus).toBe(glacier.terminus);
  });

  it('cancels with a newer generation, so the cancelled answer is dropped, and keeps the last glacier', () => {
    const fake = fakeWorker();
    const client = new PreviewWorkerClient(steadyPreviewSink, () => fake.worker);
    client.request(scenario, 'key-a');
    fake.answer(1);
    client.request(scenario, 'key-b');
    client.cancel();
    expect(fake.sent.at(-1)).toEqual({ type: 'cancel', generation: 3 });
    fake.answer(2);
    const state = useSteadyPreviewStore.getState();
    expect(state).toMatchObject({ status: 'ready', key: null, glacierKey: 'key-a' });
  });

  it('says so when the worker cannot start, and when it dies', () => {
    const client = new PreviewWorkerClient(steadyPreviewSink, () => {
      throw new Error('Worker is not defined');
    });
    client.request(scenario, 'key-a');
    expect(useSteadyPreviewStore.getState()).toMatchObject({ status: 'failed', failure: 'the preview could not be started in this browser (Worker is not defined)' });
    const fake = fakeWorker();
    const second = new PreviewWorkerClient(steadyPreviewSink, () => fake.worker);
    second.request(scenario, 'key-a');
    fake.worker.onerror?.({ message: 'out of memory', preventDefault: () => undefined } as ErrorEvent);
    expect(useSteadyPreviewStore.getState().failure).toMatch(/stopped unexpectedly \(out of memory\)/);
  });

  it('counts refusals per field until each is cleared', () => {
    const store = useSteadyPreviewStore.getState();
    store.refuse('ela', 'the ELA must be at most 10000 m');
    store.refuse('gradient', 'not a number');
    store.clearRefusal('ela');
    expect(Object.keys(useSteadyPreviewStore.getState().refusals)).toEqual(['gradient']);
    store.clearRefusal('gradient');
    expect(useSteadyPreviewStore.getState().refusals).toEqual({});
  });

  it('keeps the on/off choice in localStorage', () => {
    useSteadyPreviewStore.getState().setEnabled(false);
    expect(localStorage.getItem(STEADY_PREVIEW_SETTING)).toBe('off');
    useSteadyPreviewStore.getState().setEnabled(true);
    expect(localStorage.getItem(STEADY_PREVIEW_SETTING)).toBe('on');
  });
});
