/**
 * The steady-glacier preview worker: a thin shell around steadyPreviewDriver, kept apart from the
 * run and analysis workers so a preview never holds up a run or an analysis (and the page pauses
 * it while a run goes on, so the two do not share the second core).
 */
import type { ToPreviewWorker } from './steadyPreviewProtocol';
import { createPreviewDriver } from './steadyPreviewDriver';
import { messageChannelSchedule } from './messageChannelSchedule';

const driver = createPreviewDriver((message, transfer) => postMessage(message, transfer), messageChannelSchedule());

onmessage = (event: MessageEvent<ToPreviewWorker>) => driver.handle(event.data);
