/// <reference lib="webworker" />
/**
 * The flowline worker: a thin shell around runDriver. It yields to its own event loop between
 * slices through a MessageChannel (faster than setTimeout's clamped delay), so pause and stop
 * are heard within one slice.
 */
import type { ToWorker } from './protocol';
import { createRunDriver } from './runDriver';

const scope = self as unknown as DedicatedWorkerGlobalScope;
const channel = new MessageChannel();
let pending: (() => void) | undefined;
channel.port1.onmessage = () => {
  const resume = pending;
  pending = undefined;
  resume?.();
};

const driver = createRunDriver(
  (message, transfer) => scope.postMessage(message, transfer),
  (resume) => {
    pending = resume;
    channel.port2.postMessage(null);
  },
);

scope.onmessage = (event: MessageEvent<ToWorker>) => driver.handle(event.data);
