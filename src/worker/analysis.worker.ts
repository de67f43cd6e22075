/**
 * The analysis worker: a thin shell around analysisDriver, kept apart from the run worker so an
 * analysis never holds up a run (or the other way round). It yields between slices as
 * flowline.worker.ts does, so 'cancel' is heard within one slice.
 */
import type { ToAnalysisWorker } from './analysisProtocol';
import { createAnalysisDriver } from './analysisDriver';
import { messageChannelSchedule } from './messageChannelSchedule';

const driver = createAnalysisDriver((message) => postMessage(message), messageChannelSchedule());

onmessage = (event: MessageEvent<ToAnalysisWorker>) => driver.handle(event.data);
