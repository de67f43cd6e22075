/**
 * The flowline worker: a thin shell around runDriver. It yields to its own event loop between
 * slices (messageChannelSchedule), so pause and stop are heard within one slice.
 */
import type { ToWorker } from './protocol';
import { createRunDriver } from './runDriver';
import { messageChannelSchedule } from './messageChannelSchedule';

// The page's time to draw the run's first state before the engine takes a core (see runDriver).
const FIRST_STATE_HOLD_MS = 30;
const driver = createRunDriver(
  (message, transfer) => postMessage(message, transfer),
  messageChannelSchedule(),
  () => performance.now(),
  (resume) => setTimeout(resume, FIRST_STATE_HOLD_MS),
);

onmessage = (event: MessageEvent<ToWorker>) => driver.handle(event.data);
