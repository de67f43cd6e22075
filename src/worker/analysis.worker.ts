/// <reference lib="webworker" />
/**
 * The analysis worker: a thin shell around analysisDriver, kept apart from the run worker so an
 * analysis never holds up a run (or the other way round). It yields between slices through a
 * MessageChannel, as flowline.worker.ts does, so 'cancel' is heard within one slice.
 */
import type { ToAnalysisWorker } from './analysisProtocol';
import { createAnalysisDriver } from './analysisDriver';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const channel = new MessageChannel();
let pending: (() => void) | undefined;
channel.port1.onmessage = () => {
  const resume = pending;
  pending = undefined;
  resume?.();
};

const driver = createAnalysisDriver(
  (message) => scope.postMessage(message),
  (resume) => {
    pending = resume;
    channel.port2.postMessage(null);
  },
);

scope.onmessage = (event: MessageEvent<ToAnalysisWorker>) => driver.handle(event.data);
