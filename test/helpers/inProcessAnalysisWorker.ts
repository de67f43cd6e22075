/** The real analysis driver as an in-process worker (see inProcessWorker.ts). */
import type { FromAnalysisWorker, ToAnalysisWorker } from '../../src/worker/analysisProtocol';
import { createAnalysisDriver } from '../../src/worker/analysisDriver';
import { InProcessWorker } from './inProcessWorker';

export class InProcessAnalysisWorker extends InProcessWorker<ToAnalysisWorker, FromAnalysisWorker> {
  constructor() {
    super(createAnalysisDriver);
  }
}
