/** The real steady-glacier preview driver as an in-process worker (see inProcessWorker.ts). */
import type { FromPreviewWorker, ToPreviewWorker } from '../../src/worker/steadyPreviewProtocol';
import { createPreviewDriver } from '../../src/worker/steadyPreviewDriver';
import { InProcessWorker } from './inProcessWorker';

export class InProcessPreviewWorker extends InProcessWorker<ToPreviewWorker, FromPreviewWorker> {
  constructor() {
    super(createPreviewDriver);
  }
}
